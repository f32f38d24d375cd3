/**
 * The local inbox shows password-reset, verification and invitation links, so whoever reads it
 * can take any account. It therefore exists only for a person sitting at the machine that runs
 * Leeway, and never in a configuration reachable from elsewhere. All of these must hold:
 * - mail goes to the local sink (no SMTP_URL);
 * - the server listens on a loopback address only (scripts/serve.ts says where);
 * - APP_URL is a loopback URL (a deployment others use has a public one);
 * - the request came from a loopback address (the socket's, lib/client-address.ts), and carries
 *   no forwarding header from a proxy the operator did not declare.
 * Anything else answers 404, as if there were no inbox.
 */
import 'server-only';
import { headers } from 'next/headers';
import { CLIENT_ADDRESS_HEADER, isLoopback } from './client-address';
import { env, usesMailSink } from './env';
import { listensOnLoopbackOnly } from './listen-host';

const PROXY_HEADERS = ['forwarded', 'x-forwarded-for', 'x-real-ip'];

export function inboxAllowed(request: Headers): boolean {
  if (!usesMailSink() || !listensOnLoopbackOnly()) return false;
  if (!isLoopback(new URL(env.APP_URL).hostname)) return false;
  if (!isLoopback(request.get(CLIENT_ADDRESS_HEADER) ?? undefined)) return false;
  if (!env.TRUSTED_PROXIES && PROXY_HEADERS.some((name) => request.has(name))) return false;
  return true;
}

/** For the inbox pages: is this request allowed to see the local inbox? */
export async function canSeeInbox(): Promise<boolean> {
  return inboxAllowed(await headers());
}
