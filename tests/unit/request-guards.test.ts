/**
 * What the API refuses before any handler runs (lib/request-body.ts, lib/same-origin.ts): foreign or
 * missing origins, bodies that are not JSON, text PostgreSQL cannot store, deep nesting.
 */
import { describe, expect, it } from 'vitest';
import { isStorableText, MAX_JSON_DEPTH, readJson } from '@/lib/request-body';
import { AppError } from '@/lib/errors';
import { isCommonPassword } from '@/lib/common-passwords';
import { isSameOrigin } from '@/lib/same-origin';

const app = 'http://127.0.0.1:3000';

function json(body: string, type = 'application/json') {
  return new Request(`${app}/api/v1/projects`, { method: 'POST', headers: { 'content-type': type }, body });
}

async function refusal(request: Request): Promise<{ code: string; message: string }> {
  try {
    await readJson(request);
  } catch (error) {
    if (error instanceof AppError) return { code: error.code, message: error.message };
    throw error;
  }
  throw new Error('accepted');
}

describe('same origin', () => {
  it("accepts the app's origin and the host the request was sent to, nothing else", () => {
    expect(isSameOrigin(new Headers({ origin: app, host: 'elsewhere' }), app)).toBe(true);
    expect(isSameOrigin(new Headers({ origin: 'http://localhost:3000', host: 'localhost:3000' }), app)).toBe(true);
    expect(isSameOrigin(new Headers({ origin: 'http://127.0.0.1:8080', host: '127.0.0.1:3000' }), app)).toBe(false);
    expect(isSameOrigin(new Headers({ origin: 'https://evil.example', host: '127.0.0.1:3000' }), app)).toBe(false);
    expect(isSameOrigin(new Headers({ origin: 'null', host: '127.0.0.1:3000' }), app)).toBe(false);
    expect(isSameOrigin(new Headers({ host: '127.0.0.1:3000' }), app)).toBe(false);
  });
});

describe('JSON bodies', () => {
  it('must say they are JSON', async () => {
    expect((await refusal(json('{"name":"x"}', 'text/plain'))).code).toBe('unsupported_media_type');
    expect((await refusal(json('{"name":"x"}', 'application/x-www-form-urlencoded'))).code).toBe('unsupported_media_type');
    await expect(readJson(json('{"name":"x"}', 'application/json; charset=utf-8'))).resolves.toEqual({ name: 'x' });
  });

  it('may not hold NUL characters or unpaired surrogates, in values or keys', async () => {
    expect((await refusal(json('{"name":"a\\u0000b"}'))).code).toBe('bad_request');
    expect((await refusal(json('{"name":"\\ud800"}'))).code).toBe('bad_request');
    expect((await refusal(json('{"\\udc00":1}'))).code).toBe('bad_request');
    await expect(readJson(json('{"name":"Zürich 😀"}'))).resolves.toEqual({ name: 'Zürich 😀' });
    expect(isStorableText('\ud83d\ude00')).toBe(true);
    expect(isStorableText('\ude00\ud83d')).toBe(false);
  });

  it(`may not nest deeper than ${MAX_JSON_DEPTH} levels (a 100,000-deep array is refused at once)`, async () => {
    const deep = '['.repeat(100_000) + ']'.repeat(100_000);
    expect((await refusal(json(deep))).message).toMatch(/nests deeper/);
    const ok = '['.repeat(MAX_JSON_DEPTH) + ']'.repeat(MAX_JSON_DEPTH);
    await expect(readJson(json(ok))).resolves.toBeDefined();
  });
});

describe('common passwords', () => {
  it('are recognised, and the demo password is not one', () => {
    for (const p of ['password12', '1234567890', 'Password123', 'qwertyuiop']) expect(isCommonPassword(p)).toBe(true);
    expect(isCommonPassword('leeway-demo-2026')).toBe(false);
  });
});
