/**
 * Each demo role signs in and sees the navigation its role allows; a viewer opening an admin
 * page is refused; a wrong password gets a clear message. Real browser, server and database.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { closeBrowser, navLabels, newContext, signIn, signedInPage } from './support/browser';

afterAll(closeBrowser);

describe('signing in by role', () => {
  it.each([
    ['admin@kestrelbay.example', ['Portfolio', 'Projects', 'Compare', 'Review', 'Alerts', 'Settings']],
    ['analyst@kestrelbay.example', ['Portfolio', 'Projects', 'Compare', 'Review', 'Alerts']],
    ['reviewer@kestrelbay.example', ['Portfolio', 'Projects', 'Compare', 'Review', 'Alerts']],
    ['executive@kestrelbay.example', ['Portfolio', 'Projects', 'Compare', 'Alerts']],
  ])('%s sees %j', async (email, expected) => {
    const { context, page } = await signedInPage(email);
    expect(await navLabels(page)).toEqual(expected);
    expect(await page.getByTestId('organisation-name').innerText()).toMatch(/kestrel bay materials/i);
    await context.close();
  });

  it('a viewer opening the settings or members page is refused', async () => {
    const { context, page } = await signedInPage('executive@kestrelbay.example');
    for (const path of ['/settings', '/settings/members']) {
      await page.goto(path);
      await expect.poll(() => page.getByRole('heading', { name: 'Your role cannot open this page' }).isVisible()).toBe(true);
      expect(await page.getByLabel('WACC (% a year)').count()).toBe(0);
    }
    await context.close();
  });

  it('a wrong password shows a clear message and no session', async () => {
    const context = await newContext();
    const page = await context.newPage();
    await signIn(page, 'analyst@kestrelbay.example', 'not-the-password');
    await expect.poll(() => page.getByText('That e-mail and password do not match an account').isVisible()).toBe(true);
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await page.goto('/settings');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await context.close();
  });

  it('signing out ends the session', async () => {
    const { context, page } = await signedInPage('analyst@kestrelbay.example');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL('**/sign-in');
    await page.goto('/portfolio');
    expect(new URL(page.url()).pathname).toBe('/sign-in');
    await context.close();
  });
});
