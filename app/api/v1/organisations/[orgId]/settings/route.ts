// GET /api/v1/organisations/{orgId}/settings – one organisation's defaults, for its own members only
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { AppError } from '@/lib/errors';
import { presentSettings } from '@/lib/settings-response';
import { readSettings } from '@/lib/settings/service';

export const dynamic = 'force-dynamic';

export const GET = withAuth<{ orgId: string }>(async ({ member, params }) => {
  // Another organisation's record is answered exactly like one that does not exist.
  if (params.orgId !== member.orgId) throw new AppError('not_found', 'No such organisation.');
  return NextResponse.json({ settings: presentSettings(await readSettings(member.orgId)) });
}, operations.getOrganisationSettings);
