'use server';

import { revalidatePath } from 'next/cache';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { addInvitation, cancelPendingInvitation, deleteMember, findMemberInOrganisation, isMemberByEmail, setMemberRole } from '@/db/queries/members';
import { requirePermission } from '@/lib/dal';
import { AppError } from '@/lib/errors';
import { queueInvitationMail } from '@/lib/invitation-mail';
import { changeRoleSchema, inviteSchema } from '@/lib/validations/auth';
import type { ActionResult } from '../actions';

function failure(error: unknown, fallback: string): ActionResult {
  if (error instanceof AppError) return { ok: false, message: error.message };
  const message = (error as { body?: { message?: string } })?.body?.message;
  if (message) return { ok: false, message };
  console.error('[leeway] members action', error);
  return { ok: false, message: fallback };
}

export async function inviteMemberAction(input: unknown): Promise<ActionResult> {
  try {
    const member = await requirePermission({ invitation: ['create'] });
    const parsed = inviteSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: 'Some fields are not valid.', fields: parsed.error.flatten().fieldErrors as Record<string, string[]> };
    const { email, role } = parsed.data;
    if (await isMemberByEmail(db, { orgId: member.orgId, email })) throw new AppError('conflict', `${email} is already a member of this organisation.`);
    // The invitation and its audit entry commit together; the e-mail goes once both are stored.
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
    revalidatePath('/settings/members');
    try {
      await queueInvitationMail({ invitationId: invitation.id, email: invitation.email, organisationName: member.orgName, inviterName: member.name, role });
    } catch (error) {
      console.error('[leeway] invitation mail', error);
      return { ok: false, message: `The invitation to ${email} is saved, but its e-mail could not be sent. Send it again in a moment.` };
    }
    return { ok: true, message: `Invitation sent to ${email}.` };
  } catch (error) {
    return failure(error, 'The invitation could not be sent. Please try again.');
  }
}

export async function changeRoleAction(input: unknown): Promise<ActionResult> {
  try {
    const member = await requirePermission({ member: ['update'] });
    const parsed = changeRoleSchema.safeParse(input);
    if (!parsed.success) return { ok: false, message: 'Choose a valid role.' };
    await db.transaction().execute(async (trx) => {
      const target = await findMemberInOrganisation(trx, { orgId: member.orgId, memberId: parsed.data.memberId });
      if (!target) throw new AppError('not_found', 'That member is not in your organisation.');
      if (target.userId === member.userId) throw new AppError('forbidden', 'You cannot change your own role; ask another admin.');
      await setMemberRole(trx, { orgId: member.orgId, memberId: target.id, role: parsed.data.role });
      await recordAudit(trx, {
        orgId: member.orgId,
        actorId: member.userId,
        action: 'member.role_change',
        subjectType: 'member',
        subjectId: target.id,
        detail: { from: target.role, to: parsed.data.role },
      });
    });
    revalidatePath('/settings/members');
    return { ok: true, message: 'Role changed.' };
  } catch (error) {
    return failure(error, 'The role could not be changed. Please try again.');
  }
}

export async function removeMemberAction(memberId: string): Promise<ActionResult> {
  try {
    const member = await requirePermission({ member: ['delete'] });
    await db.transaction().execute(async (trx) => {
      const target = await findMemberInOrganisation(trx, { orgId: member.orgId, memberId: String(memberId) });
      if (!target) throw new AppError('not_found', 'That member is not in your organisation.');
      if (target.userId === member.userId) throw new AppError('forbidden', 'You cannot remove yourself; ask another admin.');
      await deleteMember(trx, { orgId: member.orgId, memberId: target.id });
      await recordAudit(trx, { orgId: member.orgId, actorId: member.userId, action: 'member.remove', subjectType: 'member', subjectId: target.id });
    });
    revalidatePath('/settings/members');
    return { ok: true, message: 'Member removed.' };
  } catch (error) {
    return failure(error, 'The member could not be removed. Please try again.');
  }
}

export async function cancelInvitationAction(invitationId: string): Promise<ActionResult> {
  try {
    const member = await requirePermission({ invitation: ['cancel'] });
    await db.transaction().execute(async (trx) => {
      const cancelled = await cancelPendingInvitation(trx, { orgId: member.orgId, invitationId: String(invitationId) });
      if (!cancelled) throw new AppError('not_found', 'That invitation is not pending in your organisation.');
      await recordAudit(trx, {
        orgId: member.orgId,
        actorId: member.userId,
        action: 'member.invitation_cancel',
        subjectType: 'invitation',
        subjectId: cancelled.id,
      });
    });
    revalidatePath('/settings/members');
    return { ok: true, message: 'Invitation cancelled.' };
  } catch (error) {
    return failure(error, 'The invitation could not be cancelled. Please try again.');
  }
}
