'use client';

import Link from 'next/link';
import useSWR from 'swr';
import { DecisionCell, FigureCells, FigureHeads, SubmittedCell } from '@/components/case-figures';
import { EmptyState } from '@/components/empty-state';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { getJson } from '@/lib/api-client';

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
  optionPremium: number;
  expandedNpv: number;
}

function QueueTable({ rows, decided }: { rows: QueueRow[]; decided?: boolean }) {
  return (
    <Table caption={decided ? 'Recently decided cases' : 'Cases waiting for a decision'}>
      <thead>
        <tr>
          <Th>Case</Th>
          <Th>Submitted</Th>
          <FigureHeads />
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
            <SubmittedCell at={r.submittedAt} by={r.submittedBy} />
            <FigureCells figures={r} currency={r.currency} />
            {decided ? <DecisionCell status={r.status === 'approved' ? 'approved' : 'returned'} at={r.decidedAt} /> : null}
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
      {decided.isLoading ? (
        <LoadingBlock label="Loading the decided cases" lines={2} />
      ) : decided.error ? (
        <LoadError message={`The decided cases did not load: ${decided.error.message}`} onRetry={() => decided.mutate()} />
      ) : decided.data && decided.data.cases.length > 0 ? (
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
