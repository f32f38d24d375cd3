/**
 * The production server: Next.js behind a few lines of node:http, so the app knows the address a
 * request really came from (lib/client-address.ts) and where it listens. `next start` cannot
 * tell either: it copies a client-supplied X-Forwarded-For through unchanged.
 *
 * Bundled to .data/serve.mjs by scripts/build-engine-worker.sh; run as
 *   HOST=127.0.0.1 PORT=3000 node .data/serve.mjs
 */
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import compression from 'compression';
import next from 'next';
import { CLIENT_ADDRESS_HEADER, clientAddress, parseTrustedProxies } from '@/lib/client-address';
import { LISTEN_HOST_VARIABLE } from '@/lib/listen-host';

const host = process.env.HOST || '127.0.0.1';
const port = Number(process.env.PORT || 3000);
const proxies = parseTrustedProxies(process.env.TRUSTED_PROXIES);
// The app reads where it listens from here (the inbox and the secret check depend on it).
process.env[LISTEN_HOST_VARIABLE] = host;

const app = next({ dev: false, dir: process.cwd(), hostname: host, port });
await app.prepare();
const handle = app.getRequestHandler();

/** False for a path whose percent-encoding is malformed or not UTF-8, which Next.js would answer with a 500. */
function decodablePath(url: string | undefined): boolean {
  try {
    decodeURIComponent((url ?? '/').split('?')[0]!);
    return true;
  } catch {
    return false;
  }
}

/**
 * Responses are compressed here, not by Next.js (`compress: false` in next.config.mjs): gzip at
 * level 1 takes about a third of the CPU of Next's level 6 for JSON a little larger (a 345 KB
 * valuation answer: about 2 ms against 6.5 ms on a two-core machine), and this thread is what
 * every request shares.
 */
const compress = compression({ level: 1 }) as unknown as (request: IncomingMessage, response: ServerResponse, next: () => void) => void;

const server = createServer((request, response) => {
  if (!decodablePath(request.url)) {
    response.writeHead(400, { 'content-type': 'application/json', 'cache-control': 'no-store' });
    response.end(JSON.stringify({ error: { code: 'bad_request', message: 'The address is not valid percent-encoded UTF-8.' } }));
    return;
  }
  request.headers[CLIENT_ADDRESS_HEADER] = clientAddress(request.socket.remoteAddress, request.headers['x-forwarded-for'], proxies);
  compress(request, response, () => void handle(request, response));
});
// An idle connection is kept for 65 s, not Node's 5: a client that sends its next request on a
// connection just as the server closes it gets ECONNRESET (an e2e request did, its connection idle
// since the test before). 65 s is beyond a load balancer's usual 60 s idle timeout, so the balancer closes
// first (common practice, no source); the headers deadline stays above it, as Node asks.
server.keepAliveTimeout = 65_000;
server.headersTimeout = 66_000;
server.listen(port, host, () => console.log(`› Leeway is listening on http://${host.includes(':') ? `[${host}]` : host}:${port}`));

// SIGTERM and Ctrl-C: stop taking connections, let the ones in flight finish, and never hang.
function stop() {
  server.close(() => process.exit(0));
  server.closeIdleConnections();
  setTimeout(() => process.exit(0), 8_000).unref();
}
process.once('SIGTERM', stop);
process.once('SIGINT', stop);
