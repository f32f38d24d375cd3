/**
 * The browser's side of the JSON API: every page fetches and writes through `/api/v1` with
 * these, so errors arrive in one shape. A non-2xx answer becomes an `ApiError` carrying the
 * server's code, message and field messages, ready to show to the user; a request that gets no
 * answer at all (offline, a dropped connection) becomes one with status 0 and words, not the
 * browser's "Failed to fetch".
 */
import { fetchOr, NO_ANSWER } from './reach-action';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
    this.name = 'ApiError';
  }

  /** The first problem of each field, for a form to show beside it. */
  fieldProblems(): Record<string, string> {
    return Object.fromEntries(Object.entries(this.fields ?? {}).map(([field, problems]) => [field, problems[0]!]));
  }
}

function request(url: string, init?: RequestInit): Promise<Response> {
  return fetchOr(url, init, () => {
    throw new ApiError(0, 'no_answer', NO_ANSWER);
  });
}

async function parse<T>(res: Response): Promise<T> {
  if (res.status === 204) return undefined as T;
  const body = await res.json().catch(() => null);
  if (!res.ok) {
    const error = body?.error;
    throw new ApiError(res.status, error?.code ?? 'unknown', error?.message ?? `The server answered ${res.status}.`, error?.fields);
  }
  return body as T;
}

/** GET a JSON resource (SWR's fetcher). */
export async function getJson<T>(url: string): Promise<T> {
  return parse<T>(await request(url, { headers: { accept: 'application/json' } }));
}

/** Send a JSON body with POST, PATCH or DELETE. */
export async function sendJson<T>(method: 'POST' | 'PATCH' | 'DELETE', url: string, body?: unknown): Promise<T> {
  return parse<T>(
    await request(url, {
      method,
      headers: body === undefined ? { accept: 'application/json' } : { 'content-type': 'application/json', accept: 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    }),
  );
}

/** POST a multipart form (file uploads); errors arrive as ApiError with the server's field messages. */
export async function sendForm<T>(url: string, form: FormData): Promise<T> {
  return parse<T>(await request(url, { method: 'POST', body: form, headers: { accept: 'application/json' } }));
}

/** The file name a Content-Disposition header gives, its UTF-8 form (`filename*`) first. */
export function filenameOf(header: string | null): string | null {
  if (!header) return null;
  const encoded = /filename\*=UTF-8''([^;\s]+)/i.exec(header)?.[1];
  if (encoded) {
    try {
      return decodeURIComponent(encoded);
    } catch {
      // A malformed escape: the plain name below is the server's other spelling of it.
    }
  }
  return /filename="([^"]*)"/i.exec(header)?.[1] ?? null;
}

/** GET a file (a PDF, a workbook) with the name the server gives it; a refusal becomes an ApiError. */
export async function getFile(url: string): Promise<{ blob: Blob; filename: string | null }> {
  const res = await request(url);
  if (!res.ok) await parse(res);
  return { blob: await res.blob(), filename: filenameOf(res.headers.get('content-disposition')) };
}
