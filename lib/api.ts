/**
 * Every route handler is wrapped once, so authentication, parsing and error mapping cannot be
 * forgotten:
 *   export const PATCH = withAuth(handler, operations.updateSettings);
 * The wrapper refuses a credential in the URL (400), refuses a state-changing request from a
 * foreign origin unless it carries an API key (403, lib/same-origin.ts), refuses path ids that
 * cannot be ids (404), authenticates by `Authorization: Bearer <key>` when the header is there
 * (lib/api-keys/; the session cookie is then ignored) and by the session otherwise (lib/dal.ts),
 * checks the role, parses
 * the JSON body with the route's zod schema when one is given (not JSON → 415, malformed → 400,
 * NUL characters, unpaired surrogates or nesting past MAX_JSON_DEPTH → 400, invalid fields →
 * 422), awaits the params and maps every error to the one error shape
 * `{ error: { code, message, fields? } }`.
 */
import { NextResponse, type NextRequest } from 'next/server';
import type { z } from 'zod';
import { bearerToken, credentialInUrl } from './api-keys/bearer';
import { authenticateApiKey } from './api-keys/authenticate';
import { requireRole, requireUser, type Member } from './dal';
import { AppError, toErrorBody } from './errors';
import { readJson } from './request-body';
import { isSameOrigin, SAFE_METHODS } from './same-origin';
import type { Operation } from './openapi/operation';

/** The route's operation (lib/openapi/operations.ts): its permission and body schema are enforced here. */
type Options<S extends z.ZodType | undefined> = Omit<Operation, 'body'> & { body?: S };

interface Context<P, B> {
  request: NextRequest;
  member: Member;
  params: P;
  body: B;
}

type Body<S> = S extends z.ZodType ? z.infer<S> : undefined;

export { MAX_JSON_BYTES, readJson, requireMediaType } from './request-body';

export function errorResponse(error: unknown): NextResponse {
  const { status, body, retryAfter } = toErrorBody(error);
  return NextResponse.json(body, { status, ...(retryAfter ? { headers: { 'retry-after': String(retryAfter) } } : {}) });
}

/** Ids in paths are uuids or the auth library's random ids: anything else cannot name a record. */
const ID_PATTERN = /^[A-Za-z0-9_-]{1,100}$/;

/**
 * Path parameters that are names a user chose, not ids: a right is named on its option card
 * (the engine's ids, up to 64 characters, any script). Control characters never name anything.
 */
const NAME_PARAMS = new Set(['rightId']);
const NAME_PATTERN = /^[^\p{Cc}]{1,64}$/u;

/** A name parameter as written, percent-decoded when it still is encoded; null when it cannot be one. */
function nameParam(value: string): string | null {
  let name = value;
  if (/%[0-9A-Fa-f]{2}/.test(value))
    try {
      name = decodeURIComponent(value);
    } catch {
      // Not an encoding after all (a name with a literal "%"): kept as written.
    }
  return NAME_PATTERN.test(name) && name.trim() === name ? name : null;
}

export function withAuth<P = Record<string, never>, S extends z.ZodType | undefined = undefined>(
  handler: (ctx: Context<P, Body<S>>) => Promise<Response>,
  options: Options<S>,
) {
  return async (request: NextRequest, route: { params: Promise<P> }): Promise<Response> => {
    try {
      if (credentialInUrl(request.nextUrl))
        throw new AppError('bad_request', 'Send an API key only in the Authorization header ("Authorization: Bearer <key>"), never in the URL.');
      const key = bearerToken(request.headers);
      // A browser never adds an Authorization header on its own, so a keyed request is not a forgery risk.
      if (key === null && !SAFE_METHODS.has(request.method) && !isSameOrigin(request.headers))
        throw new AppError('forbidden', 'This request did not come from a Leeway page (its Origin is missing or foreign).');
      const params = { ...(await route.params) } as Record<string, unknown>;
      for (const [key, value] of Object.entries(params)) {
        const name = NAME_PARAMS.has(key) && typeof value === 'string' ? nameParam(value) : null;
        if (name !== null) params[key] = name;
        else if (typeof value !== 'string' || !ID_PATTERN.test(value)) throw new AppError('not_found', 'There is no such record.');
      }
      const signedIn = key === null ? await requireUser() : await authenticateApiKey(key);
      const member = options.permission ? requireRole(signedIn, options.permission) : signedIn;
      const body = options.body ? options.body.parse(await readJson(request)) : undefined;
      return await handler({ request, member, params: params as P, body: body as Body<S> });
    } catch (error) {
      return errorResponse(error);
    }
  };
}
