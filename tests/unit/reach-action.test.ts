import { describe, expect, it } from 'vitest';
import { NO_ANSWER, reachAction } from '@/lib/reach-action';

describe('reachAction', () => {
  it("passes an action's own answer on, a refusal included", async () => {
    expect(await reachAction(async () => ({ ok: true, message: 'Saved.' }))).toEqual({ ok: true, message: 'Saved.' });
    const refused = { ok: false as const, message: 'Some fields are not valid.', fields: { wacc: ['Must be at most 50 %.'] } };
    expect(await reachAction(async () => refused)).toEqual(refused);
  });

  it('answers a call that never arrived (the fetch failed) as a failure in words', async () => {
    expect(await reachAction(() => Promise.reject(new TypeError('Failed to fetch')))).toEqual({ ok: false, message: NO_ANSWER });
  });
});
