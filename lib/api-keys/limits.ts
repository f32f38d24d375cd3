/**
 * Requests per key per minute. Generous for a planning system's sync or a BI refresh, low enough
 * that one runaway script cannot take the server from everyone else.
 */
export const API_KEY_REQUESTS_PER_MINUTE = 600;
