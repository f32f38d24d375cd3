/**
 * How an API key travels: only in `Authorization: Bearer <key>`. A key in a URL is refused,
 * because URLs end up in server logs, proxies' logs and browser history. No database and no
 * Node-only module here: proxy.ts uses it too.
 */

/** Every Leeway key starts with this, so a leaked one is recognisable (and scannable) as ours. */
export const API_KEY_START = 'lwk_';

/** Query parameter names that would carry a credential; refused whatever they hold. */
const CREDENTIAL_PARAMS = new Set(['key', 'apikey', 'api_key', 'api-key', 'access_token', 'token', 'authorization']);

export function hasBearer(headers: Headers): boolean {
  return /^bearer\s/i.test(headers.get('authorization') ?? '');
}

/**
 * The key in the Authorization header: null when there is no such header, '' when the header
 * is there but is not a bearer credential (the caller answers 401).
 */
export function bearerToken(headers: Headers): string | null {
  const header = headers.get('authorization');
  if (header === null) return null;
  const match = /^bearer\s+(\S+)\s*$/i.exec(header);
  return match?.[1] ?? '';
}

/** True when a URL's query carries something that looks like a credential. */
export function credentialInUrl(url: URL): boolean {
  for (const [name, value] of url.searchParams) {
    if (CREDENTIAL_PARAMS.has(name.toLowerCase())) return true;
    if (value.includes(API_KEY_START)) return true;
  }
  return url.pathname.includes(API_KEY_START);
}
