'use server';

import { headers } from 'next/headers';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { addOrganisation, findFirstMembership } from '@/db/queries/members';
import { auth } from '@/lib/auth';
import { currentViewer } from '@/lib/dal';
import { AppError } from '@/lib/errors';
import { organisationCreateSchema } from '@/lib/validations/auth';
import type { ActionResult } from '../settings/actions';

function slugFor(name: string): string {
  const base =
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '')
      .slice(0, 40) || 'organisation';
  return `${base}-${Math.random().toString(36).slice(2, 8)}`;
}

/** A signed-in user without an organisation creates one and becomes its admin. */
export async function createOrganisationAction(input: unknown): Promise<ActionResult> {
  const viewer = await currentViewer();
  if (!viewer) return { ok: false, message: 'Please sign in again.' };
  if (viewer.orgId) return { ok: false, message: 'You already belong to an organisation.' };
  const parsed = organisationCreateSchema.safeParse(input);
  if (!parsed.success) return { ok: false, message: 'Some fields are not valid.', fields: parsed.error.flatten().fieldErrors as Record<string, string[]> };
  try {
    // The organisation, its first admin, its settings and the audit entry commit together.
    const org = await db.transaction().execute(async (trx) => {
      if (await findFirstMembership(trx, { userId: viewer.userId })) throw new AppError('conflict', 'You already belong to an organisation.');
      const made = await addOrganisation(trx, { name: parsed.data.name, slug: slugFor(parsed.data.name), creatorId: viewer.userId });
      await recordAudit(trx, {
        orgId: made.id,
        actorId: viewer.userId,
        action: 'organization.create',
        subjectType: 'organization',
        subjectId: made.id,
        detail: { name: parsed.data.name },
      });
      return made;
    });
    await auth.api.setActiveOrganization({ headers: await headers(), body: { organizationId: org.id } });
    return { ok: true, message: 'Organisation created.' };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, message: error.message };
    console.error('[leeway] createOrganisationAction', error);
    return { ok: false, message: 'The organisation could not be created. Please try again.' };
  }
}
