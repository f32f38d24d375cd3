'use client';

import Link from 'next/link';
import useSWR from 'swr';
import { EmptyState } from '@/components/empty-state';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { getJson } from '@/lib/api-client';
import { formatDateTime, formatMoney } from '@/lib/format';

interface QueueRow {
  caseId: string;
  caseName: string;
  status: string;
  projectId: string;
  projectName: string;
  currency: string;
  submittedAt: string;
  decidedAt: string | null;
  submittedBy: string | null;
  staticNpv: number;
  expandedNpv: number;
}

function QueueTable({ rows, decided }: { rows: QueueRow[]; decided?: boolean }) {
  return (
    <Table caption={decided ? 'Recently decided cases' : 'Cases waiting for a decision'}>
      <thead>
        <tr>
          <Th>Case</Th>
          <Th>Submitted</Th>
          <Th numeric>Static NPV</Th>
          <Th numeric>Expanded NPV</Th>
          {decided ? <Th>Decision</Th> : null}
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <Tr key={r.caseId}>
            <Td>
              <Link href={`/projects/${r.projectId}/cases/${r.caseId}`} className="font-medium text-tide-600 hover:underline">
                {r.projectName} — {r.caseName}
              </Link>
            </Td>
            <Td>
              {formatDateTime(r.submittedAt)}
              <span className="block text-caption text-ink-muted">by {r.submittedBy ?? 'a former member'}</span>
            </Td>
            <Td numeric>{formatMoney(r.staticNpv, r.currency)}</Td>
            <Td numeric className="font-semibold">
              {formatMoney(r.expandedNpv, r.currency)}
            </Td>
            {decided ? (
              <Td>
                {r.status === 'approved' ? 'Approved' : 'Returned'}
                {r.decidedAt ? <span className="block text-caption text-ink-muted">{formatDateTime(r.decidedAt)}</span> : null}
              </Td>
            ) : null}
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}

/** Cases waiting for the committee, oldest first, and those decided, so a reviewer sees the whole picture. */
export function ReviewQueue() {
  const waiting = useSWR<{ cases: QueueRow[] }>('/api/v1/reviews', getJson);
  const decided = useSWR<{ cases: QueueRow[] }>('/api/v1/reviews?status=approved,returned', getJson);
  if (waiting.isLoading) return <LoadingBlock label="Loading the review queue" />;
  if (waiting.error || !waiting.data) return <LoadError message={waiting.error?.message ?? 'No answer from the server.'} onRetry={() => waiting.mutate()} />;
  return (
    <div className="flex flex-col gap-8">
      <section aria-labelledby="waiting">
        <h2 id="waiting" className="mb-3">
          Waiting for a decision ({waiting.data.cases.length})
        </h2>
        {waiting.data.cases.length === 0 ? (
          <EmptyState title="Nothing is waiting for review">Cases submitted by analysts appear here for reviewers to comment on, approve or return.</EmptyState>
        ) : (
          <QueueTable rows={waiting.data.cases} />
        )}
      </section>
      {decided.data && decided.data.cases.length > 0 ? (
        <section aria-labelledby="decided">
          <h2 id="decided" className="mb-3">
            Decided
          </h2>
          <QueueTable rows={decided.data.cases} decided />
        </section>
      ) : null}
    </div>
  );
}
