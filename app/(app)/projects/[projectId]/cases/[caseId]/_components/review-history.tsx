'use client';

import { DecisionCell, FigureCells, FigureHeads, SubmittedCell } from '@/components/case-figures';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import type { SnapshotStatus } from '@/lib/review/transitions';

/** A submitted version as the review history lists it (GET /api/v1/cases/{caseId}/snapshots). */
export interface Snapshot {
  id: string;
  caseVersion: number;
  status: SnapshotStatus;
  submittedAt: string;
  submittedBy: string | null;
  submittedByYou: boolean;
  decidedAt: string | null;
  decidedBy: string | null;
  decisionReason: string | null;
  recommendation: string | null;
  staticNpv: number | null;
  optionPremium: number | null;
  expandedNpv: number | null;
}

/** Every version submitted for review, newest first, with its figures and decision: the width of the panel, under both columns. */
export function ReviewHistory({ snapshots, currency }: { snapshots: Snapshot[]; currency: string }) {
  return (
    <section className="xl:col-span-2" aria-labelledby="review-history-heading">
      <h3 id="review-history-heading" className="mb-2 text-body font-semibold">
        Review history
      </h3>
      {snapshots.length === 0 ? (
        <p className="text-ink-soft">Not submitted yet. Submitting freezes the inputs, the result and the engine version for the reviewers.</p>
      ) : (
        <Table caption="Snapshots submitted for review">
          <thead>
            <tr>
              <Th>Submitted</Th>
              <Th>Version</Th>
              <FigureHeads />
              <Th>Decision</Th>
            </tr>
          </thead>
          <tbody>
            {snapshots.map((s) => (
              <Tr key={s.id}>
                <SubmittedCell at={s.submittedAt} by={s.submittedBy} />
                <Td className="figures">v{s.caseVersion}</Td>
                <FigureCells figures={s} currency={currency} />
                <DecisionCell
                  status={s.status}
                  at={s.decidedAt}
                  // A withdrawal is the submitter's own act.
                  by={s.status === 'withdrawn' ? s.submittedBy : s.decidedBy}
                  reason={s.decisionReason}
                />
              </Tr>
            ))}
          </tbody>
        </Table>
      )}
    </section>
  );
}
