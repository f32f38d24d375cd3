import { afterEach, describe, expect, it, vi } from 'vitest';
import { fetchOr, NO_ANSWER, reachAction } from '@/lib/reach-action';

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

describe('fetchOr', () => {
  afterEach(() => {
    vi.unstubAllGlobals();
  });
  const instead = () => new Response('no answer', { status: 503 });

  it("passes the server's answer on, an error status included", async () => {
    vi.stubGlobal('fetch', async () => new Response('refused', { status: 409 }));
    const answer = await fetchOr('/api/v1/cases', undefined, instead);
    expect([answer.status, await answer.text()]).toEqual([409, 'refused']);
  });

  it('answers a request that got no answer with what it is given instead', async () => {
    vi.stubGlobal('fetch', () => Promise.reject(new TypeError('Failed to fetch')));
    const answer = await fetchOr('/api/v1/cases', undefined, instead);
    expect([answer.status, await answer.text()]).toEqual([503, 'no answer']);
  });

  it('passes an abort on: the page asked for it', async () => {
    vi.stubGlobal('fetch', () => Promise.reject(new DOMException('The operation was aborted.', 'AbortError')));
    await expect(fetchOr('/api/v1/cases', undefined, instead)).rejects.toMatchObject({ name: 'AbortError' });
  });
});
