/** Organisation defaults: currency, risk-free rate, WACC, fiscal calendar. */
import type { Database } from '../index';
import type { OrganizationSettings } from '../types';

/** The organisation's defaults; an organisation that never saved any gets the column defaults. */
export async function findSettings(db: Database, { orgId }: { orgId: string }): Promise<OrganizationSettings> {
  const row = await db.selectFrom('organization_settings').selectAll().where('organization_id', '=', orgId).executeTakeFirst();
  return (
    row ?? {
      organization_id: orgId,
      currency: 'EUR',
      risk_free_rate: 0.03,
      wacc: 0.08,
      fiscal_year_start_month: 1,
      alert_days_before_close: 30,
      updated_at: new Date(0),
      updated_by: null,
    }
  );
}

export interface SettingsChange {
  currency: string;
  riskFreeRate: number;
  wacc: number;
  fiscalYearStartMonth: number;
  /** Absent: left as it is. */
  alertDaysBeforeClose?: number;
}

export async function updateSettings(
  db: Database,
  { orgId, userId, change }: { orgId: string; userId: string; change: SettingsChange },
): Promise<OrganizationSettings> {
  return db
    .insertInto('organization_settings')
    .values({
      organization_id: orgId,
      currency: change.currency,
      risk_free_rate: change.riskFreeRate,
      wacc: change.wacc,
      fiscal_year_start_month: change.fiscalYearStartMonth,
      ...(change.alertDaysBeforeClose !== undefined ? { alert_days_before_close: change.alertDaysBeforeClose } : {}),
      updated_by: userId,
    })
    .onConflict((c) =>
      c.column('organization_id').doUpdateSet({
        currency: change.currency,
        risk_free_rate: change.riskFreeRate,
        wacc: change.wacc,
        fiscal_year_start_month: change.fiscalYearStartMonth,
        ...(change.alertDaysBeforeClose !== undefined ? { alert_days_before_close: change.alertDaysBeforeClose } : {}),
        updated_by: userId,
        updated_at: new Date(),
      }),
    )
    .returningAll()
    .executeTakeFirstOrThrow();
}
