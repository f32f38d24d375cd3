// GET /api/v1/settings – the organisation's defaults; PATCH – change them (admins)
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { findSettings, updateSettings } from '@/db/queries/settings';
import { withAuth } from '@/lib/api';
import { settingsSchema } from '@/lib/validations/settings';
import { presentSettings as present } from '@/lib/settings-response';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async ({ member }) => NextResponse.json({ settings: present(await findSettings(db, { orgId: member.orgId })) }), {
  permission: { settings: ['read'] },
});

export const PATCH = withAuth(
  async ({ member, body }) => {
    const saved = await db.transaction().execute(async (trx) => {
      const row = await updateSettings(trx, { orgId: member.orgId, userId: member.userId, change: body });
      await recordAudit(trx, {
        orgId: member.orgId,
        actorId: member.userId,
        action: 'settings.update',
        subjectType: 'organization_settings',
        subjectId: member.orgId,
        detail: body,
      });
      return row;
    });
    return NextResponse.json({ settings: present(saved) });
  },
  { permission: { settings: ['update'] }, body: settingsSchema },
);
