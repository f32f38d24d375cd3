/** Which address a request came from (lib/client-address.ts): headers are believed only from a trusted proxy. */
import { describe, expect, it } from 'vitest';
import { clientAddress, isLoopback, parseTrustedProxies } from '@/lib/client-address';

describe('client address', () => {
  const none = parseTrustedProxies(undefined);
  const loopbackProxy = parseTrustedProxies('127.0.0.1, ::1');

  it('is the socket address when no proxy is trusted, whatever X-Forwarded-For says', () => {
    expect(clientAddress('203.0.113.5', '198.51.100.1', none)).toBe('203.0.113.5');
    expect(clientAddress('127.0.0.1', '198.51.100.1', none)).toBe('127.0.0.1');
    expect(clientAddress('::ffff:192.0.2.4', undefined, none)).toBe('192.0.2.4');
  });

  it('reads the chain from the right behind a trusted proxy, stopping at the first untrusted hop', () => {
    expect(clientAddress('127.0.0.1', '198.51.100.1', loopbackProxy)).toBe('198.51.100.1');
    // The client wrote 6.6.6.6 itself; the proxy appended the address it saw.
    expect(clientAddress('127.0.0.1', '6.6.6.6, 198.51.100.1', loopbackProxy)).toBe('198.51.100.1');
    expect(clientAddress('127.0.0.1', undefined, loopbackProxy)).toBe('127.0.0.1');
    expect(clientAddress('127.0.0.1', 'garbage', loopbackProxy)).toBe('127.0.0.1');
  });

  it('accepts CIDR ranges and refuses entries that are not addresses', () => {
    const range = parseTrustedProxies('10.0.0.0/8');
    expect(clientAddress('10.1.2.3', '198.51.100.1, 10.9.9.9', range)).toBe('198.51.100.1');
    expect(() => parseTrustedProxies('proxy.internal')).toThrow(/not an IP address/);
    expect(() => parseTrustedProxies('10.0.0.0/40')).toThrow(/prefix/);
  });

  it('knows loopback addresses', () => {
    for (const host of ['127.0.0.1', '127.3.2.1', '::1', '[::1]', 'localhost', '::ffff:127.0.0.1']) expect(isLoopback(host)).toBe(true);
    for (const host of ['0.0.0.0', '::', '192.168.1.2', 'leeway.example', '', undefined]) expect(isLoopback(host)).toBe(false);
  });
});
