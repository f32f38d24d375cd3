/**
 * Errors are mapped in one place. An AppError carries one of a closed set of codes, each with
 * its HTTP status; zod errors become 422 with field messages; anything else is a 500 with a
 * generic message (the details go to the server log, never to the client).
 */
import { z } from 'zod';
import { hasBrand } from './bundle-brand';

export const errorStatus = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  unsupported_media_type: 415,
  unprocessable: 422,
  rate_limited: 429,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof errorStatus;

const appErrorBrand: unique symbol = Symbol.for('leeway.AppError');

export class AppError extends Error {
  readonly [appErrorBrand] = true;

  /** True for an AppError made by any bundle's copy of this module (lib/bundle-brand.ts). */
  static [Symbol.hasInstance](value: unknown): value is AppError {
    return hasBrand(value, appErrorBrand);
  }

  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string[]>,
    /** Seconds after which the client may try again (sent as Retry-After on 429 and 503). */
    readonly retryAfter?: number,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

/** What a caller that went away (its request's signal fired) is answered, wherever its work was. */
export const requestCancelled = () => new AppError('bad_request', 'The request was cancelled.');

/**
 * PostgreSQL or its connection is down (connection refused or reset, server shutting down, pool
 * timeout), found on the error or on its causes (the auth library wraps the driver's error).
 */
function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  const e = error as { code?: string; message?: string; cause?: unknown } | null;
  if (!e || typeof e !== 'object' || depth > 4) return false;
  if (['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', '57P01', '57P02', '57P03', '08000', '08003', '08006'].includes(e.code ?? '')) return true;
  if (/Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error/.test(e.message ?? '')) return true;
  return isDatabaseUnavailable(e.cause, depth + 1);
}

export interface ErrorBody {
  error: { code: ErrorCode | 'internal'; message: string; fields?: Record<string, string[]> };
}

export function toErrorBody(error: unknown): { status: number; body: ErrorBody; retryAfter?: number } {
  if (error instanceof AppError) {
    return {
      status: errorStatus[error.code],
      body: { error: { code: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}) } },
      ...(error.retryAfter ? { retryAfter: error.retryAfter } : {}),
    };
  }
  if (isDatabaseUnavailable(error)) {
    console.error('[leeway] database unavailable', (error as Error).message);
    return { status: 503, body: { error: { code: 'unavailable', message: 'The database is not answering. Please try again in a moment.' } }, retryAfter: 5 };
  }
  if (error instanceof z.ZodError) {
    const fields: Record<string, string[]> = {};
    for (const issue of error.issues) {
      const key = issue.path.length ? issue.path.join('.') : '_';
      (fields[key] ??= []).push(issue.message);
    }
    return { status: 422, body: { error: { code: 'unprocessable', message: 'Some fields are not valid.', fields } } };
  }
  console.error('[leeway] unexpected error', error);
  return { status: 500, body: { error: { code: 'internal', message: 'Something went wrong on our side. Please try again.' } } };
}
