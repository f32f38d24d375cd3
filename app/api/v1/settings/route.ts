// GET /api/v1/settings – the organisation's defaults; PATCH – change them (admins)
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { presentSettings as present } from '@/lib/settings-response';
import { readSettings, saveSettings } from '@/lib/settings/service';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async ({ member }) => NextResponse.json({ settings: present(await readSettings(member.orgId)) }), operations.getSettings);

export const PATCH = withAuth(async ({ member, body }) => {
  const saved = await saveSettings(member, body);
  return NextResponse.json({ settings: present(saved) });
}, operations.updateSettings);
