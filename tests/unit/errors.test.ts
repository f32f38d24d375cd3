/** Error mapping in one place (lib/errors.ts): codes to statuses, zod to 422, the rest to a generic 500. */
import { describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { AppError, errorStatus, toErrorBody } from '@/lib/errors';

describe('toErrorBody', () => {
  it.each(Object.entries(errorStatus))('maps %s to HTTP %i', (code, status) => {
    const { status: got, body } = toErrorBody(new AppError(code as keyof typeof errorStatus, 'message'));
    expect(got).toBe(status);
    expect(body.error.code).toBe(code);
  });

  it('turns a zod error into 422 with field messages', () => {
    const parsed = z.object({ wacc: z.number().max(0.5, 'Must be at most 50 %.') }).safeParse({ wacc: 2 });
    const { status, body } = toErrorBody(parsed.error);
    expect(status).toBe(422);
    expect(body.error.fields).toEqual({ wacc: ['Must be at most 50 %.'] });
  });

  it('hides an unexpected error behind a generic 500 and logs it on the server', () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const { status, body } = toErrorBody(new Error('connection string postgres://secret'));
    expect(status).toBe(500);
    expect(JSON.stringify(body)).not.toContain('secret');
    expect(log).toHaveBeenCalled();
    log.mockRestore();
  });

  it('answers a database outage with 503 and Retry-After, also when the auth library wraps the driver error', () => {
    const log = vi.spyOn(console, 'error').mockImplementation(() => {});
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:54329'), { code: 'ECONNREFUSED' });
    const wrapped = Object.assign(new Error('Failed to get session'), { cause: refused });
    for (const error of [refused, wrapped, new Error('Connection terminated unexpectedly')]) {
      const { status, body, retryAfter } = toErrorBody(error);
      expect([status, body.error.code, retryAfter]).toEqual([503, 'unavailable', 5]);
    }
    // A programming error is still a 500, whatever its cause says about the network.
    expect(toErrorBody(new TypeError('x is undefined')).status).toBe(500);
    log.mockRestore();
  });
});
