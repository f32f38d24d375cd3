/**
 * A server action called from the browser, its failure to arrive included. An action answers an
 * ActionResult whatever happens on the server (lib/action.ts), but when the request never gets
 * there or its answer never comes back (a dropped connection, a server restarting, an action the
 * page's older script no longer finds) the call throws instead, and the form would say nothing.
 * This answers that as a failure in words as well, and `fetchOr` does the same for the API
 * client and the auth client's requests.
 */
import type { ActionResult } from './action';

/** What every page says of a request that got no answer: here, in the API client and in the auth client. */
export const NO_ANSWER = 'No answer from the server: check your connection and try again.';

export async function reachAction(call: () => Promise<ActionResult>): Promise<ActionResult> {
  try {
    return await call();
  } catch {
    return { ok: false, message: NO_ANSWER };
  }
}

/**
 * fetch, or `instead()` when the request got no answer. An abort is passed on: the page asked
 * for it and says nothing of it.
 */
export async function fetchOr(input: RequestInfo | URL, init: RequestInit | undefined, instead: () => Response): Promise<Response> {
  try {
    return await fetch(input, init);
  } catch (error) {
    if ((error as Error | null)?.name === 'AbortError') throw error;
    return instead();
  }
}
