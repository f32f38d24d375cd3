'use server';

import { headers } from 'next/headers';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { auth } from '@/lib/auth';
import { currentViewer } from '@/lib/dal';
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
    const h = await headers();
    const org = await auth.api.createOrganization({ headers: h, body: { name: parsed.data.name, slug: slugFor(parsed.data.name) } });
    if (!org) return { ok: false, message: 'The organisation could not be created.' };
    await db
      .insertInto('organization_settings')
      .values({ organization_id: org.id })
      .onConflict((c) => c.doNothing())
      .execute();
    await auth.api.setActiveOrganization({ headers: h, body: { organizationId: org.id } });
    await recordAudit(db, {
      orgId: org.id,
      actorId: viewer.userId,
      action: 'organization.create',
      subjectType: 'organization',
      subjectId: org.id,
      detail: { name: parsed.data.name },
    });
    return { ok: true, message: 'Organisation created.' };
  } catch (error) {
    console.error('[leeway] createOrganisationAction', error);
    return { ok: false, message: 'The organisation could not be created. Please try again.' };
  }
}
