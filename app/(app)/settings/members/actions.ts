'use server';

import { revalidatePath } from 'next/cache';
import { z } from 'zod';
import { runAction, type ActionResult } from '@/lib/action';
import { requirePermission } from '@/lib/dal';
import { cancelInvitation, changeRole, inviteMember, removeMember } from '@/lib/members/service';
import { changeRoleSchema, inviteSchema } from '@/lib/validations/auth';

const recordId = z.string().min(1).max(100);

export async function inviteMemberAction(input: unknown): Promise<ActionResult> {
  return runAction(
    {
      caller: () => requirePermission({ invitation: ['create'] }),
      input: inviteSchema,
      raw: input,
      failed: 'The invitation could not be sent. Please try again.',
    },
    async (member, invite) => {
      try {
        await inviteMember(member, invite);
      } finally {
        // The invitation is stored even when its e-mail could not be queued: the list shows it.
        revalidatePath('/settings/members');
      }
      return `Invitation sent to ${invite.email}.`;
    },
  );
}

export async function changeRoleAction(input: unknown): Promise<ActionResult> {
  return runAction(
    {
      caller: () => requirePermission({ member: ['update'] }),
      input: changeRoleSchema,
      raw: input,
      invalid: 'Choose a valid role.',
      failed: 'The role could not be changed. Please try again.',
    },
    async (member, change) => {
      await changeRole(member, change);
      revalidatePath('/settings/members');
      return 'Role changed.';
    },
  );
}

export async function removeMemberAction(memberId: string): Promise<ActionResult> {
  return runAction(
    { caller: () => requirePermission({ member: ['delete'] }), input: recordId, raw: memberId, failed: 'The member could not be removed. Please try again.' },
    async (member, id) => {
      await removeMember(member, id);
      revalidatePath('/settings/members');
      return 'Member removed.';
    },
  );
}

export async function cancelInvitationAction(invitationId: string): Promise<ActionResult> {
  return runAction(
    {
      caller: () => requirePermission({ invitation: ['cancel'] }),
      input: recordId,
      raw: invitationId,
      failed: 'The invitation could not be cancelled. Please try again.',
    },
    async (member, id) => {
      await cancelInvitation(member, id);
      revalidatePath('/settings/members');
      return 'Invitation cancelled.';
    },
  );
}
