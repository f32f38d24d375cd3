import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/components/empty-state';
import { Forbidden } from '@/components/forbidden';
import { PageHeader } from '@/components/page-header';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { ValuationCaution } from '@/components/valuation-caution';
import { formatDateTime } from '@/lib/format';
import { guardPage } from '@/lib/page-guard';
import { listOrganisationAlerts, type WatchAlertKind } from '@/lib/watch/alerts';

export const metadata: Metadata = { title: 'Alerts' };

const kindWords: Record<WatchAlertKind, string> = {
  in_region: 'Use it now',
  near: 'Near its boundary',
  window_opened: 'Window opened',
  window_closing: 'Window closing',
};

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
        <Table caption="Alerts, newest first">
          <thead>
            <tr>
              <Th>Raised</Th>
              <Th>Case</Th>
              <Th>Alert</Th>
              <Th>What changed</Th>
            </tr>
          </thead>
          <tbody>
            {alerts.map((a) => (
              <Tr key={a.id}>
                <Td className="whitespace-nowrap">{formatDateTime(a.createdAt)}</Td>
                <Td>
                  <Link className="text-tide-700 underline-offset-2 hover:underline" href={`/projects/${a.projectId}/cases/${a.caseId}?tab=watch`}>
                    {a.projectName} — {a.caseName}
                  </Link>
                </Td>
                <Td className="whitespace-nowrap">{kindWords[a.kind]}</Td>
                <Td>{a.message}</Td>
              </Tr>
            ))}
          </tbody>
        </Table>
      )}
      <div className="mt-8">
        <ValuationCaution />
      </div>
    </>
  );
}
