/**
 * Who works in an organisation: members, their roles and the invitations sent, as the members
 * page and its actions read and change them. Each change commits with its audit entry; the
 * rules the auth library would apply to its own endpoints (who may, not yourself, not twice)
 * are checked here, because the rows are written by the app in its own transactions
 * (db/queries/members.ts says why).
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import {
  addInvitation,
  addOrganisation,
  cancelPendingInvitation,
  deleteMember,
  findFirstMembership,
  findInvitation,
  findMemberInOrganisation,
  isMemberByEmail,
  listMembers,
  listOpenInvitationsFor,
  listPendingInvitations,
  setMemberRole,
} from '@/db/queries/members';
import type { Member, Viewer } from '../dal';
import { AppError } from '../errors';
import { queueInvitationMail } from '../invitation-mail';

const notInOrganisation = () => new AppError('not_found', 'That member is not in your organisation.');

export async function listMembership(member: Member) {
  const [members, invitations] = await Promise.all([listMembers(db, { orgId: member.orgId }), listPendingInvitations(db, { orgId: member.orgId })]);
  return { members, invitations };
}

/** An invitation as its link shows it (no sign-in needed: the id is the secret), or undefined. */
export async function readInvitation(invitationId: string) {
  return findInvitation(db, { invitationId });
}

/** Invitations waiting for a signed-in user who belongs to no organisation yet. */
export async function invitationsWaitingFor(viewer: Viewer) {
  return listOpenInvitationsFor(db, { email: viewer.email });
}

/**
 * Stores the invitation with its audit entry, then queues its e-mail; an e-mail that cannot be
 * queued is said (the invitation stays, and can be sent again).
 */
export async function inviteMember(member: Member, { email, role }: { email: string; role: string }): Promise<void> {
  if (await isMemberByEmail(db, { orgId: member.orgId, email })) throw new AppError('conflict', `${email} is already a member of this organisation.`);
  const invitation = await db.transaction().execute(async (trx) => {
    const made = await addInvitation(trx, { orgId: member.orgId, email, role, inviterId: member.userId });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'member.invite',
      subjectType: 'invitation',
      subjectId: made.id,
      detail: { email, role },
    });
    return made;
  });
  try {
    await queueInvitationMail({ invitationId: invitation.id, email: invitation.email, organisationName: member.orgName, inviterName: member.name, role });
  } catch (error) {
    console.error('[leeway] invitation mail', error);
    throw new AppError('unavailable', `The invitation to ${email} is saved, but its e-mail could not be sent. Send it again in a moment.`);
  }
}

export async function changeRole(member: Member, { memberId, role }: { memberId: string; role: string }): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const target = await findMemberInOrganisation(trx, { orgId: member.orgId, memberId });
    if (!target) throw notInOrganisation();
    if (target.userId === member.userId) throw new AppError('forbidden', 'You cannot change your own role; ask another admin.');
    await setMemberRole(trx, { orgId: member.orgId, memberId: target.id, role });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'member.role_change',
      subjectType: 'member',
      subjectId: target.id,
      detail: { from: target.role, to: role },
    });
  });
}

export async function removeMember(member: Member, memberId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const target = await findMemberInOrganisation(trx, { orgId: member.orgId, memberId });
    if (!target) throw notInOrganisation();
    if (target.userId === member.userId) throw new AppError('forbidden', 'You cannot remove yourself; ask another admin.');
    await deleteMember(trx, { orgId: member.orgId, memberId: target.id });
    await recordAudit(trx, { orgId: member.orgId, actorId: member.userId, action: 'member.remove', subjectType: 'member', subjectId: target.id });
  });
}

export async function cancelInvitation(member: Member, invitationId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const cancelled = await cancelPendingInvitation(trx, { orgId: member.orgId, invitationId });
    if (!cancelled) throw new AppError('not_found', 'That invitation is not pending in your organisation.');
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'member.invitation_cancel',
      subjectType: 'invitation',
      subjectId: cancelled.id,
    });
  });
}

function slugFor(name: string): string {
  const base =
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 40) || 'organisation';
  return `${base}-${Math.random().toString(36).slice(2, 8)}`;
}

/** A signed-in user without an organisation creates one: it, its first admin, its settings and the audit entry commit together. */
export async function createOrganisation(viewer: Viewer, name: string): Promise<{ id: string; name: string }> {
  return db.transaction().execute(async (trx) => {
    if (await findFirstMembership(trx, { userId: viewer.userId })) throw new AppError('conflict', 'You already belong to an organisation.');
    const made = await addOrganisation(trx, { name, slug: slugFor(name), creatorId: viewer.userId });
    await recordAudit(trx, {
      orgId: made.id,
      actorId: viewer.userId,
      action: 'organization.create',
      subjectType: 'organization',
      subjectId: made.id,
      detail: { name },
    });
    return made;
  });
}
