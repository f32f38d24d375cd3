/**
 * A panel whose data does not come says so and offers to try again; while it loads it shows
 * that it is loading. It never shows an empty state in place of data it has not read: before,
 * a case's discussion said "No comments yet." while its comments loaded and when they failed,
 * and the review queue left its decided cases out without a word when they failed. A request
 * that gets no answer at all says so in words, signing in and out included, and words typed
 * while a comment travels stay in its box.
 */
import type { Page } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { NO_ANSWER } from '@/lib/reach-action';
import { closeBrowser, newContext, signedInPage } from './support/browser';
import { DEMO_PASSWORD } from './support/env';
import { demoCase } from './support/demo';

afterAll(async () => {
  await closeBrowser();
  await db.destroy();
});

/** Answers `pattern` with a 503 until the returned function is called. */
async function failing(page: Page, pattern: RegExp): Promise<() => Promise<void>> {
  const handler = (route: Parameters<Parameters<Page['route']>[1]>[0]) =>
    route.fulfill({ status: 503, contentType: 'application/json', body: JSON.stringify({ error: { code: 'unavailable', message: 'Try again shortly.' } }) });
  await page.route(pattern, handler);
  return () => page.unroute(pattern, handler);
}

/**
 * Presses Try again. The data fetcher also retries on its own a few seconds after a failure, so
 * on a slow machine the button may already have gone with the error: either way the data comes.
 */
async function tryAgain(scope: Pick<Page, 'getByRole'>) {
  const button = scope.getByRole('button', { name: 'Try again' });
  if (await button.isVisible()) await button.click({ timeout: 5_000 }).catch(() => undefined);
}

/** The reviewer on the hub case's Review tab, its discussion loaded and its comment box ready. */
async function hubDiscussion() {
  const hub = await demoCase('Cold-storage hub', 'Base case');
  const { context, page } = await signedInPage('reviewer@kestrelbay.example');
  await page.goto(`${hub.url}?tab=review`);
  const discussion = page.getByRole('region', { name: 'Discussion' });
  const box = discussion.getByLabel('Comment');
  await expect.poll(() => box.isVisible(), { timeout: 30_000 }).toBe(true);
  return { context, page, discussion, box };
}

describe('load states', () => {
  it("a case's discussion says when its comments could not be read, and reads them on request", async () => {
    const hub = await demoCase('Cold-storage hub', 'Base case');
    const { context, page } = await signedInPage('reviewer@kestrelbay.example');
    const comments = new RegExp(`/api/v1/cases/${hub.caseId}/comments$`);
    const recover = await failing(page, comments);
    await page.goto(`${hub.url}?tab=review`);
    const discussion = page.getByRole('region', { name: 'Discussion' });
    await expect.poll(() => discussion.getByRole('alert').isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await discussion.getByText('Try again shortly.').isVisible()).toBe(true);
    expect(await discussion.getByText('No comments yet.').count()).toBe(0);

    await recover();
    const stored = (await (await page.request.get(`/api/v1/cases/${hub.caseId}/comments`)).json()).comments as { body: string }[];
    await tryAgain(discussion);
    // While they load again the panel says so; then the comments stored are shown, or that there are none.
    const shown = stored.length ? discussion.getByText(stored[0]!.body.split('\n')[0]!, { exact: false }).first() : discussion.getByText('No comments yet.');
    await expect.poll(() => shown.isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await discussion.getByRole('alert').count()).toBe(0);
    await context.close();
  });

  it('the review queue says when its decided cases could not be read', async () => {
    const { context, page } = await signedInPage('reviewer@kestrelbay.example');
    const recover = await failing(page, /\/api\/v1\/reviews\?status=approved,returned$/);
    await page.goto('/review');
    await expect.poll(() => page.getByText('The decided cases did not load: Try again shortly.').isVisible(), { timeout: 30_000 }).toBe(true);
    await recover();
    await tryAgain(page);
    await expect.poll(() => page.getByRole('heading', { name: 'Decided' }).isVisible(), { timeout: 30_000 }).toBe(true);
    await context.close();
  });

  it('a comment sent offline says the server did not answer, and stays typed', async () => {
    // Before, the toast read the browser's own words for a failed request: "Failed to fetch".
    const { context, page, discussion, box } = await hubDiscussion();
    await context.setOffline(true);
    await box.pressSequentially('Is the salvage value net of removal costs?');
    await discussion.getByRole('button', { name: 'Add comment' }).click();
    await expect.poll(() => page.getByText(NO_ANSWER).isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await box.inputValue()).toBe('Is the salvage value net of removal costs?');
    await context.setOffline(false);
    await context.close();
  });

  it('a comment sent on a slow connection leaves the words typed after it in the box', async () => {
    // Before, the answer emptied the box, taking with it what was typed while the comment travelled.
    const { context, page, discussion, box } = await hubDiscussion();
    const first = `Is the year-4 capex quote firm? (${Date.now()})`;
    await box.pressSequentially(first);
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 2000, downloadThroughput: -1, uploadThroughput: -1 });
    await discussion.getByRole('button', { name: 'Add comment' }).click();
    await box.pressSequentially(' And the salvage?');
    // The comment is in the list (not only in the box, whose text would match too).
    await expect.poll(() => discussion.getByRole('listitem').filter({ hasText: first }).isVisible(), { timeout: 30_000 }).toBe(true);
    expect(await box.inputValue()).toBe('And the salvage?');
    await context.close();
  });

  it('signing in and out offline say the server did not answer; signing out then leaves the session alone', async () => {
    // Before, the auth library's client threw on a request that got no answer and the form said nothing.
    const context = await newContext();
    const page = await context.newPage();
    await page.goto('/sign-in');
    const signInButton = page.getByRole('button', { name: 'Sign in' });
    await expect.poll(() => signInButton.isEnabled(), { timeout: 30_000 }).toBe(true);
    await page.getByLabel('E-mail').fill('reviewer@kestrelbay.example');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await context.setOffline(true);
    await signInButton.click();
    await expect.poll(() => page.getByText(NO_ANSWER).isVisible(), { timeout: 30_000 }).toBe(true);
    await context.setOffline(false);
    await signInButton.click();
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: 30_000 });

    const signOut = page.getByRole('button', { name: 'Sign out' });
    await expect.poll(() => signOut.isVisible(), { timeout: 30_000 }).toBe(true);
    await context.setOffline(true);
    await signOut.click();
    await expect.poll(() => page.getByText(NO_ANSWER).isVisible(), { timeout: 30_000 }).toBe(true);
    await context.setOffline(false);
    expect((await page.request.get('/api/v1/cases')).status()).toBe(200);
    await context.close();
  });
});
