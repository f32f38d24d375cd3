// GET /api/v1/settings – the organisation's defaults; PATCH – change them (admins)
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { findSettings, saveSettingsAudited } from '@/db/queries/settings';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentSettings as present } from '@/lib/settings-response';

export const dynamic = 'force-dynamic';

export const GET = withAuth(
  async ({ member }) => NextResponse.json({ settings: present(await findSettings(db, { orgId: member.orgId })) }),
  operations.getSettings,
);

export const PATCH = withAuth(async ({ member, body }) => {
  const saved = await saveSettingsAudited(db, { orgId: member.orgId, userId: member.userId, change: body });
  return NextResponse.json({ settings: present(saved) });
}, operations.updateSettings);
