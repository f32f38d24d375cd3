import type { Metadata } from 'next';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { formatDateTime } from '@/lib/format';
import { guardPage } from '@/lib/page-guard';
import { readSettings } from '@/lib/settings/service';
import { SettingsForm } from './_components/settings-form';
import { SettingsNav } from './_components/settings-nav';

export const metadata: Metadata = { title: 'Settings' };

export default async function SettingsPage() {
  const member = await guardPage({ settings: ['update'] });
  if (member === 'forbidden') return <Forbidden />;
  const settings = await readSettings(member.orgId);
  return (
    <>
      <PageHeader title="Settings" lead={`Defaults every new case of ${member.orgName} starts from.`} />
      <SettingsNav />
      <SettingsForm
        initial={{
          currency: settings.currency,
          riskFreeRate: settings.risk_free_rate,
          wacc: settings.wacc,
          fiscalYearStartMonth: settings.fiscal_year_start_month,
          alertDaysBeforeClose: settings.alert_days_before_close,
        }}
      />
      {settings.updated_by ? <p className="mt-6 text-caption text-ink-muted">Last saved {formatDateTime(settings.updated_at)}.</p> : null}
    </>
  );
}
