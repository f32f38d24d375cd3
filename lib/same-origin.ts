/**
 * Cross-site request forgery: a browser sends the session cookie with any request a foreign page
 * makes, so a state-changing request is accepted only when its Origin is the app's own — the
 * public APP_URL, or the host the request was sent to (what a browser on the app's page sends).
 * A request without an Origin is refused too: browsers always send one on POST, PATCH and DELETE.
 * Used by proxy.ts for every unsafe request, pages' server actions included, and again by
 * lib/api.ts for the API routes.
 */
export const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export function isSameOrigin(headers: Headers, appUrl = process.env.APP_URL ?? 'http://127.0.0.1:3000'): boolean {
  const origin = headers.get('origin');
  if (!origin || origin === 'null') return false;
  let parsed: URL;
  try {
    parsed = new URL(origin);
  } catch {
    return false;
  }
  if (parsed.origin === new URL(appUrl).origin) return true;
  const host = headers.get('host');
  return !!host && parsed.host === host && (parsed.protocol === 'http:' || parsed.protocol === 'https:');
}
