/**
 * Which address a request really came from. Clients can write any `X-Forwarded-For` they like,
 * so the header is believed only when the connection comes from a proxy the operator named in
 * TRUSTED_PROXIES (addresses or CIDR ranges); then the chain is read from the right and the
 * first hop that is not a trusted proxy is the client. Otherwise the socket's own address is
 * the client, whatever the headers say. scripts/serve.ts writes the answer into
 * CLIENT_ADDRESS_HEADER (overwriting anything the client sent), and everything that keys on an
 * address (sign-in limits, the local inbox) reads that header alone.
 */
import { BlockList, isIP } from 'node:net';

export const CLIENT_ADDRESS_HEADER = 'x-leeway-client-address';

/** A BlockList of the trusted proxies in a comma-separated list; throws on an entry that is neither an address nor a range. */
export function parseTrustedProxies(list: string | undefined): BlockList {
  const proxies = new BlockList();
  for (const raw of (list ?? '').split(',')) {
    const entry = raw.trim();
    if (!entry) continue;
    const [address, prefix] = entry.split('/');
    const family = isIP(address ?? '');
    if (!family) throw new Error(`TRUSTED_PROXIES: "${entry}" is not an IP address or CIDR range.`);
    const type = family === 6 ? 'ipv6' : 'ipv4';
    if (prefix === undefined) proxies.addAddress(address!, type);
    else {
      const bits = Number(prefix);
      if (!/^\d+$/.test(prefix) || bits > (family === 6 ? 128 : 32)) throw new Error(`TRUSTED_PROXIES: "${entry}" has a bad prefix length.`);
      proxies.addSubnet(address!, bits, type);
    }
  }
  return proxies;
}

function plain(address: string): string {
  // An IPv4 client on a dual-stack socket shows as ::ffff:a.b.c.d.
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(address);
  return mapped ? mapped[1]! : address;
}

function isTrusted(proxies: BlockList, address: string): boolean {
  const family = isIP(address);
  return family !== 0 && proxies.check(address, family === 6 ? 'ipv6' : 'ipv4');
}

/** The client's address, from the socket and (behind a trusted proxy only) the forwarded chain. */
export function clientAddress(socketAddress: string | undefined, forwardedFor: string | string[] | undefined, proxies: BlockList): string {
  let address = plain(socketAddress ?? '');
  if (!isTrusted(proxies, address)) return address || 'unknown';
  const chain = (Array.isArray(forwardedFor) ? forwardedFor.join(',') : (forwardedFor ?? ''))
    .split(',')
    .map((hop) => plain(hop.trim()))
    .filter(Boolean);
  for (let k = chain.length - 1; k >= 0; k--) {
    const hop = chain[k]!;
    if (!isIP(hop)) return address; // a garbled chain: stop at the last hop we could trust
    address = hop;
    if (!isTrusted(proxies, hop)) return hop;
  }
  return address;
}

/** True for 127.0.0.0/8, ::1 and localhost. */
export function isLoopback(host: string | undefined): boolean {
  if (!host) return false;
  const h = plain(host.replace(/^\[|\]$/g, '')).toLowerCase();
  return h === 'localhost' || h === '::1' || /^127\.\d+\.\d+\.\d+$/.test(h);
}
