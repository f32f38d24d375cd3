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
});
