import { statusLabels, type CaseStatus, type SnapshotStatus } from '@/lib/review/transitions';

/** A case's or a snapshot's review status in words, with a tone that never carries the meaning alone. */
export function StatusBadge({ status }: { status: CaseStatus | SnapshotStatus }) {
  const tone: Record<CaseStatus | SnapshotStatus, string> = {
    draft: 'bg-paper-sunk text-ink-soft',
    in_review: 'bg-ember-100 text-ember-700',
    approved: 'bg-moss-100 text-moss-700',
    returned: 'bg-brick-100 text-brick-700',
    withdrawn: 'bg-paper-sunk text-ink-muted',
  };
  return <span className={`rounded px-2 py-0.5 text-caption font-semibold uppercase tracking-wide ${tone[status]}`}>{statusLabels[status]}</span>;
}
