/**
 * The secret that signs sessions and every e-mailed token. A secret anyone can read (a value in
 * the source, a short one) lets a stranger forge a verification or e-mail-change token and take
 * an account, so Leeway never runs with one:
 * - BETTER_AUTH_SECRET set: used if it is at least 32 characters and not a value published
 *   anywhere; a short or published value is refused unless the server listens on loopback only.
 * - unset: a random secret is generated on first start, kept in AUTH_SECRET_FILE
 *   (`.data/auth-secret`, mode 0600) and read on later starts, so sessions survive restarts.
 */
import { randomBytes } from 'node:crypto';
import { chmodSync, mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';

export const MIN_SECRET_LENGTH = 32;

/** Values that were ever written in this repository, or are a library's published default. */
const PUBLISHED_SECRETS = new Set([
  'leeway-local-development-secret-not-for-production',
  'leeway-test-secret-not-for-production',
  'better-auth-secret-123456789',
  'better-auth-secret-12345678901234567890',
]);

export class UnsafeSecretError extends Error {
  override name = 'UnsafeSecretError';
}

function readOrCreate(file: string): string {
  try {
    const existing = readFileSync(file, 'utf8').trim();
    // Someone may have copied the folder with looser permissions: tighten them again.
    if ((statSync(file).mode & 0o077) !== 0) chmodSync(file, 0o600);
    if (existing.length >= MIN_SECRET_LENGTH) return existing;
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
  }
  mkdirSync(path.dirname(file), { recursive: true });
  const fresh = randomBytes(32).toString('base64url');
  try {
    // 'wx': when two processes start at once, the first one's secret wins and the other reads it.
    writeFileSync(file, `${fresh}\n`, { mode: 0o600, flag: 'wx' });
    return fresh;
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    return readFileSync(file, 'utf8').trim();
  }
}

export function resolveAuthSecret(args: { configured: string | undefined; file: string; loopbackOnly: boolean }): string {
  const configured = args.configured?.trim();
  if (!configured) return readOrCreate(args.file);
  const problem = PUBLISHED_SECRETS.has(configured)
    ? 'is a published value'
    : configured.length < MIN_SECRET_LENGTH
      ? `is shorter than ${MIN_SECRET_LENGTH} characters`
      : null;
  if (problem && !args.loopbackOnly)
    throw new UnsafeSecretError(
      `BETTER_AUTH_SECRET ${problem}, and this server can be reached from other machines. Set a long random value ` +
        '(for example `openssl rand -base64 32`), or unset it to have Leeway generate one in its data folder.',
    );
  return configured;
}
