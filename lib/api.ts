/**
 * Every route handler is wrapped once, so authentication, parsing and error mapping cannot be
 * forgotten:
 *   export const PATCH = withAuth(handler, { permission: { settings: ['update'] } });
 * The wrapper checks the session and role (lib/dal.ts), parses the JSON body with the route's
 * zod schema when one is given (malformed JSON → 400, invalid fields → 422), awaits the params
 * and maps every error to the one error shape `{ error: { code, message, fields? } }`.
 */
import { NextResponse, type NextRequest } from 'next/server';
import type { z } from 'zod';
import { requirePermission, requireUser, type Member } from './dal';
import { AppError, toErrorBody } from './errors';
import type { Permission } from './permissions';

/** The most a JSON body may weigh before it is refused with 413. */
export const MAX_JSON_BYTES = 1_000_000;

interface Options<S extends z.ZodType | undefined> {
  permission?: Permission;
  body?: S;
}

interface Context<P, B> {
  request: NextRequest;
  member: Member;
  params: P;
  body: B;
}

type Body<S> = S extends z.ZodType ? z.infer<S> : undefined;

export function errorResponse(error: unknown): NextResponse {
  const { status, body } = toErrorBody(error);
  return NextResponse.json(body, { status });
}

export async function readJson(request: Request): Promise<unknown> {
  const length = Number(request.headers.get('content-length') ?? '0');
  if (length > MAX_JSON_BYTES) throw new AppError('too_large', `The request body is over ${MAX_JSON_BYTES / 1_000_000} MB.`);
  const text = await request.text();
  if (text.length > MAX_JSON_BYTES) throw new AppError('too_large', `The request body is over ${MAX_JSON_BYTES / 1_000_000} MB.`);
  try {
    return JSON.parse(text);
  } catch {
    throw new AppError('bad_request', 'The request body is not valid JSON.');
  }
}

export function withAuth<P = Record<string, never>, S extends z.ZodType | undefined = undefined>(
  handler: (ctx: Context<P, Body<S>>) => Promise<Response>,
  options: Options<S> = {},
) {
  return async (request: NextRequest, route: { params: Promise<P> }): Promise<Response> => {
    try {
      const member = options.permission ? await requirePermission(options.permission) : await requireUser();
      const body = options.body ? options.body.parse(await readJson(request)) : undefined;
      return await handler({ request, member, params: await route.params, body: body as Body<S> });
    } catch (error) {
      return errorResponse(error);
    }
  };
}
