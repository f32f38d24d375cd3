/**
 * The cells every list of cases and versions shares, so the three tables that show them (a
 * project's cases, the review queue, a case's review history) read alike: the three figures in
 * one order with the expanded NPV emphasised, who submitted when, and the decision in words.
 */
import { formatDateTime, formatMoney } from '@/lib/format';
import type { SnapshotStatus } from '@/lib/review/transitions';
import { StatusBadge } from './status-badge';
import { Td, Th } from './ui/table';

export interface Figures {
  staticNpv: number | null;
  optionPremium: number | null;
  expandedNpv: number | null;
}

export function FigureHeads() {
  return (
    <>
      <Th numeric>Static NPV</Th>
      <Th numeric>Option premium</Th>
      <Th numeric>Expanded NPV</Th>
    </>
  );
}

/** A missing figure (a case never valued) reads "–". */
export function FigureCells({ figures, currency }: { figures: Figures | null | undefined; currency: string }) {
  return (
    <>
      <Td numeric>{formatMoney(figures?.staticNpv, currency)}</Td>
      <Td numeric>{formatMoney(figures?.optionPremium, currency)}</Td>
      <Td numeric className="font-semibold">
        {formatMoney(figures?.expandedNpv, currency)}
      </Td>
    </>
  );
}

export function SubmittedCell({ at, by }: { at: string; by: string | null }) {
  return (
    <Td>
      {formatDateTime(at)}
      <span className="block text-caption text-ink-muted">by {by ?? 'a former member'}</span>
    </Td>
  );
}

/** The decision's status, and who decided (or withdrew) when, with the reason given; `by` left out where the list does not say who. */
export function DecisionCell({ status, at, by, reason }: { status: SnapshotStatus; at: string | null; by?: string | null; reason?: string | null }) {
  return (
    <Td>
      <StatusBadge status={status} />
      {at ? (
        <span className="block text-caption text-ink-muted">
          {by === undefined ? '' : `by ${by ?? 'a former member'}, `}
          {formatDateTime(at)}
          {reason ? `: “${reason}”` : ''}
        </span>
      ) : null}
    </Td>
  );
}
