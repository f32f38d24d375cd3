'use server';

import { headers } from 'next/headers';
import { runAction, type ActionResult } from '@/lib/action';
import { auth } from '@/lib/auth';
import { currentViewer } from '@/lib/dal';
import { AppError } from '@/lib/errors';
import { createOrganisation } from '@/lib/members/service';
import { organisationCreateSchema } from '@/lib/validations/auth';

/** A signed-in user without an organisation creates one and becomes its admin. */
export async function createOrganisationAction(input: unknown): Promise<ActionResult> {
  return runAction(
    {
      caller: async () => {
        const viewer = await currentViewer();
        if (!viewer) throw new AppError('unauthorized', 'Please sign in again.');
        if (viewer.orgId) throw new AppError('conflict', 'You already belong to an organisation.');
        return viewer;
      },
      input: organisationCreateSchema,
      raw: input,
      failed: 'The organisation could not be created. Please try again.',
    },
    async (viewer, { name }) => {
      const org = await createOrganisation(viewer, name);
      await auth.api.setActiveOrganization({ headers: await headers(), body: { organizationId: org.id } });
      return 'Organisation created.';
    },
  );
}
