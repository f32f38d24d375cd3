/** The auth secret (lib/auth-secret.ts): generated once and kept private, never a published value off loopback. */
import { mkdtempSync, readFileSync, statSync, writeFileSync, chmodSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { MIN_SECRET_LENGTH, resolveAuthSecret, UnsafeSecretError } from '@/lib/auth-secret';

const folder = () => mkdtempSync(path.join(tmpdir(), 'leeway-secret-'));

describe('auth secret', () => {
  it('is generated on first start into a file only its owner can read, and reused after', () => {
    const file = path.join(folder(), 'nested', 'auth-secret');
    const first = resolveAuthSecret({ configured: undefined, file, loopbackOnly: false });
    expect(first.length).toBeGreaterThanOrEqual(MIN_SECRET_LENGTH);
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(resolveAuthSecret({ configured: '', file, loopbackOnly: false })).toBe(first);
    expect(readFileSync(file, 'utf8').trim()).toBe(first);
    // Two installs never share one.
    expect(resolveAuthSecret({ configured: undefined, file: path.join(folder(), 's'), loopbackOnly: false })).not.toBe(first);
  });

  it('tightens a kept file that others can read', () => {
    const file = path.join(folder(), 'auth-secret');
    writeFileSync(file, 'x'.repeat(40));
    chmodSync(file, 0o644);
    resolveAuthSecret({ configured: undefined, file, loopbackOnly: false });
    expect(statSync(file).mode & 0o777).toBe(0o600);
  });

  it('refuses the value this repository once shipped, or a short one, when others can reach the server', () => {
    const file = path.join(folder(), 'auth-secret');
    for (const configured of ['leeway-local-development-secret-not-for-production', 'leeway-test-secret-not-for-production', 'short-secret-123'])
      expect(() => resolveAuthSecret({ configured, file, loopbackOnly: false })).toThrow(UnsafeSecretError);
    // On loopback only, a developer may use one.
    expect(resolveAuthSecret({ configured: 'short-secret-123', file, loopbackOnly: true })).toBe('short-secret-123');
    const strong = 'q'.repeat(MIN_SECRET_LENGTH);
    expect(resolveAuthSecret({ configured: strong, file, loopbackOnly: false })).toBe(strong);
  });
});
