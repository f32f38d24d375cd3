/**
 * Reading a request body safely, before any handler sees it: JSON only when it says it is JSON
 * (415), at most MAX_JSON_BYTES (413), well-formed (400), nested at most MAX_JSON_DEPTH deep and
 * holding only text PostgreSQL and UTF-8 can store (400). A NUL or an unpaired surrogate reached
 * the database as a 500 before, and a 100,000-deep array stopped the engine's worker.
 */
import { AppError } from './errors';

/** The most a JSON body may weigh before it is refused with 413. */
export const MAX_JSON_BYTES = 1_000_000;

/** Deeper JSON than this is refused before anything walks it (a real model nests about 6 deep). */
export const MAX_JSON_DEPTH = 64;

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
