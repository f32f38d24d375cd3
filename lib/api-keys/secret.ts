/**
 * A key's secret: 32 random bytes after the recognisable start, kept only as its SHA-256.
 * A slow password hash is not needed: the secret has 256 bits of entropy, so its hash cannot be
 * searched, and looking a key up by its hash costs one index probe.
 */
import { createHash, randomBytes } from 'node:crypto';
import { API_KEY_START } from './bearer';

/** What is shown in lists so people can tell keys apart: the start and 8 characters. */
const PREFIX_LENGTH = API_KEY_START.length + 8;
const KEY_PATTERN = new RegExp(`^${API_KEY_START}[A-Za-z0-9_-]{43}$`);

export function newApiKey(): { key: string; prefix: string; secretHash: string } {
  const key = API_KEY_START + randomBytes(32).toString('base64url');
  return { key, prefix: key.slice(0, PREFIX_LENGTH), secretHash: hashApiKey(key) };
}

export function hashApiKey(key: string): string {
  return createHash('sha256').update(key).digest('hex');
}

export function looksLikeApiKey(key: string): boolean {
  return KEY_PATTERN.test(key);
}
