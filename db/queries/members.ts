/** Memberships and invitations, always scoped by organisation. */
import { randomUUID } from 'node:crypto';
import type { Database } from '../index';

/**
 * The user's membership with its organisation's name and demo flag, in one query: in the
 * organisation given, or (without one, or when it is not theirs) the first they joined.
 */
export async function findMembership(db: Database, { userId, orgId }: { userId: string; orgId?: string | null }) {
  const base = db
    .selectFrom('member')
    .innerJoin('organization', 'organization.id', 'member.organizationId')
    .select(['member.organizationId', 'member.role', 'organization.name as organizationName', 'organization.metadata as organizationMetadata'])
    .where('member.userId', '=', userId);
  return (orgId ? await base.where('member.organizationId', '=', orgId).executeTakeFirst() : undefined) ?? findFirstMembership(db, { userId });
}

export async function findFirstMembership(db: Database, { userId }: { userId: string }) {
  return db
    .selectFrom('member')
    .innerJoin('organization', 'organization.id', 'member.organizationId')
    .select(['member.organizationId', 'member.role', 'organization.name as organizationName', 'organization.metadata as organizationMetadata'])
    .where('member.userId', '=', userId)
    .orderBy('member.createdAt')
    .executeTakeFirst();
}

export async function listMembers(db: Database, { orgId }: { orgId: string }) {
  return db
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .select(['member.id', 'member.role', 'member.createdAt', 'user.id as userId', 'user.name', 'user.email'])
    .where('member.organizationId', '=', orgId)
    .orderBy('user.name')
    .execute();
}

export async function listPendingInvitations(db: Database, { orgId }: { orgId: string }) {
  return db
    .selectFrom('invitation')
    .select(['id', 'email', 'role', 'expiresAt', 'createdAt'])
    .where('organizationId', '=', orgId)
    .where('status', '=', 'pending')
    .orderBy('createdAt', 'desc')
    .execute();
}

export async function findInvitation(db: Database, { invitationId }: { invitationId: string }) {
  return db
    .selectFrom('invitation')
    .innerJoin('organization', 'organization.id', 'invitation.organizationId')
    .select(['invitation.id', 'invitation.email', 'invitation.role', 'invitation.status', 'invitation.expiresAt', 'organization.name as organizationName'])
    .where('invitation.id', '=', invitationId)
    .executeTakeFirst();
}

/** Pending, unexpired invitations sent to an address, with the inviting organisation's name. */
export async function listOpenInvitationsFor(db: Database, { email, now = new Date() }: { email: string; now?: Date }) {
  return db
    .selectFrom('invitation')
    .innerJoin('organization', 'organization.id', 'invitation.organizationId')
    .select(['invitation.id', 'organization.name'])
    .where('invitation.email', '=', email.toLowerCase())
    .where('invitation.status', '=', 'pending')
    .where('invitation.expiresAt', '>', now)
    .execute();
}

/** The e-mail addresses of the organisation's reviewers (who hear of submissions and withdrawals). */
export async function listReviewerEmails(db: Database, { orgId }: { orgId: string }): Promise<string[]> {
  const rows = await db
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .select('user.email')
    .where('member.organizationId', '=', orgId)
    .where('member.role', '=', 'reviewer')
    .execute();
  return rows.map((r) => r.email);
}

export async function findUserEmail(db: Database, { userId }: { userId: string }): Promise<string | null> {
  return (await db.selectFrom('user').select('email').where('id', '=', userId).executeTakeFirst())?.email ?? null;
}

/*
 * The writes below are the app's own, not the auth library's endpoints, so that each runs in
 * the caller's transaction together with its audit entry. They write the rows in the auth
 * library's shape (its accept-invitation endpoint reads them); the rules the library would
 * apply (who may, not yourself, not twice) are checked by the callers, the members and welcome
 * actions.
 */

export const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

export async function findMemberInOrganisation(db: Database, { orgId, memberId }: { orgId: string; memberId: string }) {
  return db.selectFrom('member').select(['id', 'userId', 'role']).where('id', '=', memberId).where('organizationId', '=', orgId).executeTakeFirst();
}

export async function isMemberByEmail(db: Database, { orgId, email }: { orgId: string; email: string }): Promise<boolean> {
  const row = await db
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .select('member.id')
    .where('member.organizationId', '=', orgId)
    .where((eb) => eb.fn('lower', ['user.email']), '=', email.toLowerCase())
    .executeTakeFirst();
  return row !== undefined;
}

export async function setMemberRole(db: Database, { orgId, memberId, role }: { orgId: string; memberId: string; role: string }) {
  await db.updateTable('member').set({ role }).where('id', '=', memberId).where('organizationId', '=', orgId).execute();
}

export async function deleteMember(db: Database, { orgId, memberId }: { orgId: string; memberId: string }) {
  await db.deleteFrom('member').where('id', '=', memberId).where('organizationId', '=', orgId).execute();
}

/** A new pending invitation; earlier pending ones to the same address in this organisation are cancelled. */
export async function addInvitation(db: Database, args: { orgId: string; email: string; role: string; inviterId: string; now?: Date }) {
  const now = args.now ?? new Date();
  const email = args.email.toLowerCase();
  await db
    .updateTable('invitation')
    .set({ status: 'canceled' })
    .where('organizationId', '=', args.orgId)
    .where('email', '=', email)
    .where('status', '=', 'pending')
    .execute();
  return db
    .insertInto('invitation')
    .values({
      id: randomUUID(),
      organizationId: args.orgId,
      email,
      role: args.role,
      status: 'pending',
      expiresAt: new Date(now.getTime() + INVITATION_LIFETIME_MS),
      createdAt: now,
      inviterId: args.inviterId,
    })
    .returning(['id', 'email', 'role', 'expiresAt'])
    .executeTakeFirstOrThrow();
}

/** Cancels a pending invitation of this organisation; undefined when there is none. */
export async function cancelPendingInvitation(db: Database, { orgId, invitationId }: { orgId: string; invitationId: string }) {
  return db
    .updateTable('invitation')
    .set({ status: 'canceled' })
    .where('id', '=', invitationId)
    .where('organizationId', '=', orgId)
    .where('status', '=', 'pending')
    .returning(['id', 'email'])
    .executeTakeFirst();
}

/** An organisation, its creator as admin and its default settings. */
export async function addOrganisation(db: Database, args: { name: string; slug: string; creatorId: string; now?: Date }) {
  const now = args.now ?? new Date();
  const org = await db
    .insertInto('organization')
    .values({ id: randomUUID(), name: args.name, slug: args.slug, logo: null, metadata: null, createdAt: now })
    .returning(['id', 'name'])
    .executeTakeFirstOrThrow();
  await db.insertInto('member').values({ id: randomUUID(), organizationId: org.id, userId: args.creatorId, role: 'admin', createdAt: now }).execute();
  await db.insertInto('organization_settings').values({ organization_id: org.id }).execute();
  return org;
}
