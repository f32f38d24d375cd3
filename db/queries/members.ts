/** Memberships and invitations, always scoped by organisation. */
import type { Database } from '../index';

export async function findMembership(db: Database, { orgId, userId }: { orgId: string; userId: string }) {
  return db.selectFrom('member').select(['id', 'role', 'organizationId']).where('organizationId', '=', orgId).where('userId', '=', userId).executeTakeFirst();
}

export async function findFirstMembership(db: Database, { userId }: { userId: string }) {
  return db
    .selectFrom('member')
    .innerJoin('organization', 'organization.id', 'member.organizationId')
    .select(['member.organizationId', 'member.role', 'organization.name as organizationName'])
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
