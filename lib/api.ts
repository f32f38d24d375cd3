/**
 * Every route handler is wrapped once, so authentication, parsing and error mapping cannot be
 * forgotten:
 *   export const PATCH = withAuth(handler, { permission: { settings: ['update'] } });
 * The wrapper refuses a state-changing request from a foreign origin (403, lib/same-origin.ts),
 * refuses path ids that cannot be ids (404), checks the session and role (lib/dal.ts), parses
 * the JSON body with the route's zod schema when one is given (not JSON → 415, malformed → 400,
 * NUL characters, unpaired surrogates or nesting past MAX_JSON_DEPTH → 400, invalid fields →
 * 422), awaits the params and maps every error to the one error shape
 * `{ error: { code, message, fields? } }`.
 */
import { NextResponse, type NextRequest } from 'next/server';
import type { z } from 'zod';
import { requirePermission, requireUser, type Member } from './dal';
import { AppError, toErrorBody } from './errors';
import { isSameOrigin, SAFE_METHODS } from './same-origin';
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

/** Deeper JSON than this is refused before anything walks it (a real model nests about 6 deep). */
export const MAX_JSON_DEPTH = 64;

/** Ids in paths are uuids or the auth library's random ids: anything else cannot name a record. */
const ID_PATTERN = /^[A-Za-z0-9_-]{1,100}$/;

// A NUL (PostgreSQL cannot store it in text) or a surrogate that is not half of a pair (not UTF-8).
const BAD_TEXT = /\u0000|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

/** True for text PostgreSQL and UTF-8 can hold. */
export function isStorableText(text: string): boolean {
  return !BAD_TEXT.test(text);
}

/** Refuses nesting past MAX_JSON_DEPTH and text that cannot be stored, walking iteratively (no recursion to overflow). */
function checkParsed(value: unknown): void {
  const stack: [unknown, number][] = [[value, 0]];
  while (stack.length) {
    const [item, depth] = stack.pop()!;
    if (typeof item === 'string') {
      if (!isStorableText(item)) throw new AppError('bad_request', 'Text in the request holds a NUL character or an unpaired surrogate.');
    } else if (item && typeof item === 'object') {
      if (depth >= MAX_JSON_DEPTH) throw new AppError('bad_request', `The request body nests deeper than ${MAX_JSON_DEPTH} levels.`);
      for (const [key, child] of Object.entries(item)) {
        if (!isStorableText(key)) throw new AppError('bad_request', 'A key in the request holds a NUL character or an unpaired surrogate.');
        stack.push([child, depth + 1]);
      }
    }
  }
}

/** 415 unless the request says its body is of one of these media types. */
export function requireMediaType(request: Request, types: string[]): void {
  const type = (request.headers.get('content-type') ?? '').split(';')[0]!.trim().toLowerCase();
  if (!types.includes(type)) throw new AppError('unsupported_media_type', `Send the body as ${types.join(' or ')}.`);
}

export async function readJson(request: Request): Promise<unknown> {
  requireMediaType(request, ['application/json']);
  const length = Number(request.headers.get('content-length') ?? '0');
  if (length > MAX_JSON_BYTES) throw new AppError('too_large', `The request body is over ${MAX_JSON_BYTES / 1_000_000} MB.`);
  const text = await request.text();
  if (text.length > MAX_JSON_BYTES) throw new AppError('too_large', `The request body is over ${MAX_JSON_BYTES / 1_000_000} MB.`);
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    throw new AppError('bad_request', 'The request body is not valid JSON.');
  }
  checkParsed(parsed);
  return parsed;
}

export function withAuth<P = Record<string, never>, S extends z.ZodType | undefined = undefined>(
  handler: (ctx: Context<P, Body<S>>) => Promise<Response>,
  options: Options<S> = {},
) {
  return async (request: NextRequest, route: { params: Promise<P> }): Promise<Response> => {
    try {
      if (!SAFE_METHODS.has(request.method) && !isSameOrigin(request.headers))
        throw new AppError('forbidden', 'This request did not come from a Leeway page (its Origin is missing or foreign).');
      const params = await route.params;
      for (const value of Object.values(params ?? {}))
        if (typeof value !== 'string' || !ID_PATTERN.test(value)) throw new AppError('not_found', 'There is no such record.');
      const member = options.permission ? await requirePermission(options.permission) : await requireUser();
      const body = options.body ? options.body.parse(await readJson(request)) : undefined;
      return await handler({ request, member, params, body: body as Body<S> });
    } catch (error) {
      return errorResponse(error);
    }
  };
}
