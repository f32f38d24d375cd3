'use client';
/** better-auth's client, with the organization plugin and Leeway's roles. */
import { organizationClient } from 'better-auth/client/plugins';
import { createAuthClient } from 'better-auth/react';
import { ac, roles } from './permissions';
import { fetchOr, NO_ANSWER } from './reach-action';

/**
 * fetch, with no answer at all (offline, a dropped connection) answered as a 503 that says so in
 * the auth library's error shape: the client would throw instead, and a form would say nothing.
 */
const answeringFetch: typeof fetch = (input, init) => fetchOr(input, init, () => Response.json({ code: 'NO_ANSWER', message: NO_ANSWER }, { status: 503 }));

export const authClient = createAuthClient({ fetchOptions: { customFetchImpl: answeringFetch }, plugins: [organizationClient({ ac, roles })] });

/** The request never got an answer (see answeringFetch): its message says so. */
export function noAnswer<E extends { code?: string }>(error: E | null | undefined): error is E & { message: string } {
  return error?.code === 'NO_ANSWER';
}
