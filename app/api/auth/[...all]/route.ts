// /api/auth/* – better-auth's own endpoints (sign-in, sign-up, sessions, organisations). The
// session token travels only in its httpOnly cookie: it is taken out of every JSON answer, where
// a script on the page could read it.
import { toNextJsHandler } from 'better-auth/next-js';
import { auth } from '@/lib/auth';

const handler = toNextJsHandler(auth);

function withoutToken(value: unknown): unknown {
  if (!value || typeof value !== 'object' || Array.isArray(value)) return value;
  const { token: _token, ...rest } = value as Record<string, unknown>;
  if (rest.session && typeof rest.session === 'object') rest.session = withoutToken(rest.session);
  return rest;
}

async function scrubbed(response: Response): Promise<Response> {
  if (!(response.headers.get('content-type') ?? '').includes('application/json')) return response;
  const text = await response.text();
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    return new Response(text, response);
  }
  const headers = new Headers(response.headers);
  headers.delete('content-length');
  return new Response(JSON.stringify(withoutToken(body)), { status: response.status, statusText: response.statusText, headers });
}

export async function GET(request: Request) {
  return scrubbed(await handler.GET(request));
}

export async function POST(request: Request) {
  return scrubbed(await handler.POST(request));
}
