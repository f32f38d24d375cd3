/**
 * A server action called from the browser, its failure to arrive included. An action answers an
 * ActionResult whatever happens on the server (lib/action.ts), but when the request never gets
 * there or its answer never comes back (a dropped connection, a server restarting, an action the
 * page's older script no longer finds) the call throws instead, and the form would say nothing.
 * This answers that as a failure in words as well.
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
