/**
 * An admin invites a new member; the invitation e-mail is captured by the sink; the invitee
 * creates an account, confirms the address from the second e-mail, accepts and is in, with the
 * invited role's navigation; later they sign in again with their own password. The admin then
 * changes their role and removes them, and the server applies both at once.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { closeBrowser, navLabels, newContext, signIn, signedInPage } from './support/browser';
import { firstLink, waitForMail } from './support/mail';

afterAll(closeBrowser);

describe('inviting a member', () => {
  it('goes from invitation e-mail to a signed-in reviewer', async () => {
    const invitee = `new.reviewer.${Date.now()}@kestrelbay.example`;
    const admin = await signedInPage('admin@kestrelbay.example');
    await admin.page.goto('/settings/members');
    const form = admin.page.getByRole('form', { name: 'Invite a member' });
    await form.getByLabel('E-mail').fill(invitee);
    await form.getByLabel('Role').selectOption('reviewer');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => admin.page.getByText(`Invitation sent to ${invitee}.`).isVisible()).toBe(true);
    await expect.poll(() => admin.page.getByRole('cell', { name: invitee, exact: true }).isVisible(), { timeout: 10_000 }).toBe(true);

    const invitation = await waitForMail(invitee, /Join Kestrel Bay Materials/);
    const context = await newContext();
    const page = await context.newPage();
    await page.goto(firstLink(invitation));
    await expect.poll(() => page.getByRole('heading', { name: 'Join Kestrel Bay Materials' }).isVisible()).toBe(true);
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.waitForURL('**/sign-up**');
    expect(await page.getByLabel('E-mail').inputValue()).toBe(invitee);
    await page.getByLabel('Your name').fill('Robin Castell');
    await page.getByLabel('Password').fill('a-strong-passphrase');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL('**/verify**');

    const confirm = await waitForMail(invitee, /Confirm your e-mail/);
    await page.goto(firstLink(confirm));
    await page.waitForURL('**/accept-invitation/**');
    await page.getByRole('button', { name: 'Accept and continue' }).click();
    await page.waitForURL('**/portfolio');
    expect(await navLabels(page)).toEqual(['Portfolio', 'Projects', 'Compare', 'Review', 'Alerts']);

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL('**/sign-in');
    await signIn(page, invitee, 'a-strong-passphrase');
    await page.waitForURL('**/portfolio');
    expect(await page.getByTestId('organisation-name').innerText()).toMatch(/kestrel bay materials/i);

    await admin.page.goto('/settings/members');
    await expect.poll(() => admin.page.getByRole('cell', { name: 'Robin Castell', exact: true }).isVisible()).toBe(true);

    // The admin makes the new member a read-only executive: the server applies it on their next request.
    await admin.page.getByLabel('Role of Robin Castell').selectOption('viewer');
    await expect.poll(() => admin.page.getByText('Role changed.').isVisible()).toBe(true);
    await page.goto('/portfolio');
    expect(await navLabels(page)).toEqual(['Portfolio', 'Projects', 'Compare', 'Alerts']);
    await page.goto('/review');
    await expect.poll(() => page.getByRole('heading', { name: 'Your role cannot open this page' }).isVisible()).toBe(true);

    // The admin removes them: they keep their account but no longer see the organisation.
    await admin.page.getByRole('button', { name: 'Remove Robin Castell' }).click();
    await admin.page.getByRole('dialog').getByRole('button', { name: 'Remove' }).click();
    await expect.poll(() => admin.page.getByText('Member removed.').isVisible()).toBe(true);
    await page.goto('/portfolio');
    await page.waitForURL('**/welcome');
    await context.close();
    await admin.context.close();
  });
});
