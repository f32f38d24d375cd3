/**
 * Alerts as a table, newest first: when, what kind, what changed, and on the Alerts page which
 * case (a link to its Watch tab). The same rows on the Alerts page and the case's Watch tab.
 */
import Link from 'next/link';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { formatDateTime } from '@/lib/format';
import { alertKindWords, type AlertKind } from '@/lib/watch/status-words';

export interface AlertRow {
  id: string;
  kind: AlertKind;
  message: string;
  createdAt: string | Date;
}

export interface AlertOnCase extends AlertRow {
  projectId: string;
  caseId: string;
  projectName: string;
  caseName: string;
}

export function AlertsTable({ caption, alerts }: { caption: string; alerts: AlertRow[] | AlertOnCase[] }) {
  const withCase = alerts.some((a) => 'caseId' in a);
  return (
    <Table caption={caption}>
      <thead>
        <tr>
          <Th>Raised</Th>
          {withCase ? <Th>Case</Th> : null}
          <Th>Alert</Th>
          <Th>What changed</Th>
        </tr>
      </thead>
      <tbody>
        {alerts.map((a) => (
          <Tr key={a.id}>
            <Td className="whitespace-nowrap">{formatDateTime(a.createdAt)}</Td>
            {'caseId' in a ? (
              <Td>
                <Link className="text-tide-700 underline-offset-2 hover:underline" href={`/projects/${a.projectId}/cases/${a.caseId}?tab=watch`}>
                  {a.projectName} — {a.caseName}
                </Link>
              </Td>
            ) : null}
            <Td className="whitespace-nowrap">{alertKindWords[a.kind]}</Td>
            <Td>{a.message}</Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}
