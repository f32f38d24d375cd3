/** How organisation settings appear in the API: rates as fractions per year. */
import type { OrganizationSettings } from '@/db/types';

export function presentSettings(s: OrganizationSettings) {
  return {
    currency: s.currency,
    riskFreeRate: s.risk_free_rate,
    wacc: s.wacc,
    fiscalYearStartMonth: s.fiscal_year_start_month,
    alertDaysBeforeClose: s.alert_days_before_close,
  };
}
