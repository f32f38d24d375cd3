/**
 * The organisation's defaults (currency, risk-free rate, WACC, fiscal calendar) as pages, routes
 * and the server action read and change them; a change and its audit entry commit together.
 */
import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { findSettings, updateSettings, type SettingsChange } from '@/db/queries/settings';
import type { OrganizationSettings } from '@/db/types';
import type { Member } from '../dal';

export async function readSettings(orgId: string): Promise<OrganizationSettings> {
  return findSettings(db, { orgId });
}

export async function saveSettings(member: Member, change: SettingsChange): Promise<OrganizationSettings> {
  return db.transaction().execute(async (trx) => {
    const row = await updateSettings(trx, { orgId: member.orgId, userId: member.userId, change });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'settings.update',
      subjectType: 'organization_settings',
      subjectId: member.orgId,
      detail: { ...change },
    });
    return row;
  });
}
