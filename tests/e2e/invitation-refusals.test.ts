/**
 * Invitations that must not let anyone in: a cancelled one, an expired one and one addressed to
 * someone else. For each, the invitation page says it cannot be used and the auth library's own
 * accept endpoint, called directly by a signed-in account, refuses it and adds no membership.
 * A last, valid invitation accepted through the same endpoint proves the refusals are the
 * invitation's and not the call's.
 */
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { closeBrowser, newContext, signIn, signedInPage } from './support/browser';
import { firstLink, waitForMail } from './support/mail';

const stamp = Date.now();
const newcomer = `newcomer.${stamp}@example.com`;
const password = 'a-long-invented-passphrase';

const contexts: BrowserContext[] = [];
let admin: Page;
let person: Page;
let harrowId = '';

async function invite(email: string): Promise<string> {
  await admin.goto('/settings/members');
  const form = admin.getByRole('form', { name: 'Invite a member' });
  await form.getByLabel('E-mail').pressSequentially(email, { delay: 5 });
  await form.getByLabel('Role').selectOption('analyst');
  await form.getByRole('button', { name: 'Send invitation' }).click();
  await expect.poll(() => admin.getByText(`Invitation sent to ${email}.`).isVisible()).toBe(true);
  const row = await db
    .selectFrom('invitation')
    .select('id')
    .where('email', '=', email)
    .where('organizationId', '=', harrowId)
    .where('status', '=', 'pending')
    .orderBy('createdAt', 'desc')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** The auth library's own endpoint, as a script in the signed-in person's browser would call it. */
const acceptDirectly = (invitationId: string) => person.request.post('/api/auth/organization/accept-invitation', { data: { invitationId } });

const memberships = async () =>
  (await db.selectFrom('member').innerJoin('user', 'user.id', 'member.userId').select('member.id').where('user.email', '=', newcomer).execute()).length;

async function expectUnusable(invitationId: string, pageText: string) {
  await person.goto(`/accept-invitation/${invitationId}`);
  await expect.poll(() => person.getByText(pageText).first().isVisible()).toBe(true);
  expect(await person.getByRole('button', { name: 'Accept and continue' }).count()).toBe(0);
  const answer = await acceptDirectly(invitationId);
  expect(answer.status()).toBeGreaterThanOrEqual(400);
  expect(answer.status()).toBeLessThan(500);
  expect(await memberships()).toBe(0);
}

beforeAll(async () => {
  harrowId = (await db.selectFrom('organization').select('id').where('slug', '=', 'harrow-fen-logistics').executeTakeFirstOrThrow()).id;
  const owner = await signedInPage('owner@harrowfen.example');
  contexts.push(owner.context);
  admin = owner.page;

  person = await confirmedPerson(newcomer, 'Ash Newcomer');
});

/** A person with a confirmed account and no organisation yet, signed in on the welcome page. */
async function confirmedPerson(email: string, name: string): Promise<Page> {
  const context = await newContext();
  contexts.push(context);
  const page = await context.newPage();
  const signUp = await page.request.post('/api/auth/sign-up/email', { data: { email, password, name } });
  expect(signUp.status()).toBe(200);
  await page.goto(firstLink(await waitForMail(email, /Confirm your e-mail/, 30_000)));
  // Confirming signs the person in and lands on the welcome page; sign in only if it did not.
  await page.waitForURL(/\/(welcome|sign-in)/, { timeout: 30_000 });
  if (!page.url().includes('/welcome')) {
    await signIn(page, email, password);
    await page.waitForURL('**/welcome', { timeout: 30_000 });
  }
  return page;
}

const auditOf = (action: string, subjectId: string) =>
  db.selectFrom('audit_log').select(['action', 'actor_id']).where('action', '=', action).where('subject_id', '=', subjectId).execute();

afterAll(async () => {
  await db
    .deleteFrom('member')
    .where('organizationId', '=', harrowId)
    .where('userId', 'in', db.selectFrom('user').select('id').where('email', '=', newcomer))
    .execute();
  for (const c of contexts) await c.close();
  await closeBrowser();
  await db.destroy();
});

describe('invitations that cannot be used', () => {
  it('a cancelled invitation: the mailed link and the accept endpoint both refuse it', async () => {
    const id = await invite(newcomer);
    const mailed = firstLink(await waitForMail(newcomer, /Join Harrow Fen Logistics/));
    expect(mailed).toContain(id);
    await admin.getByRole('button', { name: `Cancel the invitation to ${newcomer}` }).click();
    await expect.poll(() => admin.getByText('Invitation cancelled.').isVisible()).toBe(true);
    await person.goto(mailed);
    await expectUnusable(id, 'This invitation cannot be used');
    expect(await auditOf('member.invite', id)).toHaveLength(1);
    expect(await auditOf('member.invitation_cancel', id)).toHaveLength(1);
  });

  it('an expired invitation is refused', async () => {
    const id = await invite(newcomer);
    await db
      .updateTable('invitation')
      .set({ expiresAt: new Date(Date.now() - 60_000) })
      .where('id', '=', id)
      .execute();
    await expectUnusable(id, 'This invitation cannot be used');
    await db.updateTable('invitation').set({ status: 'canceled' }).where('id', '=', id).execute();
  });

  it('an invitation to another address is refused to whoever opens it', async () => {
    const id = await invite(`someone.else.${stamp}@example.com`);
    await expectUnusable(id, `You are signed in as ${newcomer}`);
  });

  it('a valid invitation to this address is accepted by the same endpoint', async () => {
    const id = await invite(newcomer);
    const answer = await acceptDirectly(id);
    expect(answer.status()).toBe(200);
    expect(await memberships()).toBe(1);
  });
});

describe('a person without an organisation', () => {
  it('creates one on the welcome page, is its admin, and the creation is in its activity', async () => {
    const email = `founder.${stamp}@example.com`;
    const page = await confirmedPerson(email, 'Rowan Founder');
    await page.getByLabel('Organisation name').pressSequentially('Invented Test Works', { delay: 5 });
    await page.getByRole('button', { name: 'Create organisation' }).click();
    await page.waitForURL('**/settings', { timeout: 30_000 });
    expect(await page.getByTestId('organisation-name').innerText()).toMatch(/invented test works/i);
    const member = await db
      .selectFrom('member')
      .innerJoin('user', 'user.id', 'member.userId')
      .select(['member.role', 'member.organizationId'])
      .where('user.email', '=', email)
      .execute();
    expect(member.map((m) => m.role)).toEqual(['admin']);
    expect(await auditOf('organization.create', member[0]!.organizationId)).toHaveLength(1);
    // Its default settings were created with it.
    expect((await page.request.get('/api/v1/settings')).status()).toBe(200);
  });
});
