'use server';

import { revalidatePath } from 'next/cache';
import { headers } from 'next/headers';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { auth } from '@/lib/auth';
import { requirePermission } from '@/lib/dal';
import { AppError } from '@/lib/errors';
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
    await auth.api.createInvitation({ headers: await headers(), body: { email, role: role as 'viewer', organizationId: member.orgId, resend: true } });
    await recordAudit(db, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'member.invite',
      subjectType: 'invitation',
      subjectId: email,
      detail: { email, role },
    });
    revalidatePath('/settings/members');
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
    const target = await db
      .selectFrom('member')
      .select(['id', 'userId', 'role'])
      .where('id', '=', parsed.data.memberId)
      .where('organizationId', '=', member.orgId)
      .executeTakeFirst();
    if (!target) throw new AppError('not_found', 'That member is not in your organisation.');
    if (target.userId === member.userId) throw new AppError('forbidden', 'You cannot change your own role; ask another admin.');
    await auth.api.updateMemberRole({
      headers: await headers(),
      body: { memberId: target.id, role: parsed.data.role as 'viewer', organizationId: member.orgId },
    });
    await recordAudit(db, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'member.role_change',
      subjectType: 'member',
      subjectId: target.id,
      detail: { from: target.role, to: parsed.data.role },
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
    const target = await db
      .selectFrom('member')
      .select(['id', 'userId'])
      .where('id', '=', String(memberId))
      .where('organizationId', '=', member.orgId)
      .executeTakeFirst();
    if (!target) throw new AppError('not_found', 'That member is not in your organisation.');
    if (target.userId === member.userId) throw new AppError('forbidden', 'You cannot remove yourself; ask another admin.');
    await auth.api.removeMember({ headers: await headers(), body: { memberIdOrEmail: target.id, organizationId: member.orgId } });
    await recordAudit(db, { orgId: member.orgId, actorId: member.userId, action: 'member.remove', subjectType: 'member', subjectId: target.id });
    revalidatePath('/settings/members');
    return { ok: true, message: 'Member removed.' };
  } catch (error) {
    return failure(error, 'The member could not be removed. Please try again.');
  }
}

export async function cancelInvitationAction(invitationId: string): Promise<ActionResult> {
  try {
    const member = await requirePermission({ invitation: ['cancel'] });
    const invitation = await db
      .selectFrom('invitation')
      .select('id')
      .where('id', '=', String(invitationId))
      .where('organizationId', '=', member.orgId)
      .executeTakeFirst();
    if (!invitation) throw new AppError('not_found', 'That invitation is not in your organisation.');
    await auth.api.cancelInvitation({ headers: await headers(), body: { invitationId: invitation.id } });
    await recordAudit(db, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'member.invitation_cancel',
      subjectType: 'invitation',
      subjectId: invitation.id,
    });
    revalidatePath('/settings/members');
    return { ok: true, message: 'Invitation cancelled.' };
  } catch (error) {
    return failure(error, 'The invitation could not be cancelled. Please try again.');
  }
}
