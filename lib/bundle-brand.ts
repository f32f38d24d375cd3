/**
 * `instanceof` for classes whose objects cross Next.js's bundles. Next.js evaluates a module
 * once for pages and once for route handlers, so one process can hold two copies of a class.
 * The engine pool is kept on globalThis (one per process) and throws the errors of whichever
 * copy made it: when a page valued first (the portfolio's watch list does), the API route's
 * `instanceof AppError` was false and a refused model or a full queue answered 500. A brand
 * registered with Symbol.for is the same symbol in every copy, so a class that checks it in
 * `static [Symbol.hasInstance]` recognises its objects from any copy.
 */
export function hasBrand(value: unknown, brand: symbol): boolean {
  return typeof value === 'object' && value !== null && (value as Record<symbol, unknown>)[brand] === true;
}
