import type { Metadata } from 'next';
import { AlertsTable } from '@/components/alerts-table';
import { EmptyState } from '@/components/empty-state';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { ValuationCaution } from '@/components/valuation-caution';
import { guardPage } from '@/lib/page-guard';
import { listOrganisationAlerts } from '@/lib/watch/alerts';

export const metadata: Metadata = { title: 'Alerts' };

/** Every change in a followed right's standing, newest first: the alerts also sent by e-mail. */
export default async function AlertsPage() {
  const member = await guardPage({ case: ['read'] });
  if (member === 'forbidden') return <Forbidden />;
  const alerts = await listOrganisationAlerts(member);
  return (
    <>
      <PageHeader
        title="Alerts"
        lead="Approved rights being followed: each time one comes into its region or near its boundary, or its window opens or is about to close, it is listed here once and e-mailed to the case's analyst and the reviewers."
      />
      {alerts.length === 0 ? (
        <EmptyState title="No alerts yet">
          Alerts start once a version is approved and the project&rsquo;s value is recorded on the case&rsquo;s Watch tab.
        </EmptyState>
      ) : (
        <AlertsTable caption="Alerts, newest first" alerts={alerts} />
      )}
      <div className="mt-8">
        <ValuationCaution />
      </div>
    </>
  );
}
