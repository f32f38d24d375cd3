'use client';

import useSWR from 'swr';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { getJson } from '@/lib/api-client';
import type { ActivityJson } from '@/lib/case-json';
import { formatDateTime, formatMoney } from '@/lib/format';

type Entry = ActivityJson;

/** One audit entry in words a reader of the project page understands. */
function describe(e: Entry, currency: string): string {
  const name = typeof e.detail.name === 'string' ? `“${e.detail.name}”` : 'a case';
  switch (e.action) {
    case 'project.create':
      return 'created the project';
    case 'project.update':
      return 'changed the project';
    case 'case.create':
      return `created the case ${name}`;
    case 'case.update':
      return `saved ${name} (version ${String(e.detail.version ?? '?')})`;
    case 'case.duplicate':
      return `duplicated a case as ${name}`;
    case 'case.delete':
      return `deleted the case ${name}`;
    case 'case.value':
      return `valued ${name}: expanded NPV ${formatMoney(Number(e.detail.expandedNpv), currency)}`;
    case 'case.submit':
      return `submitted ${name} for review`;
    case 'case.approve':
      return `approved ${name}`;
    case 'case.return':
      return `returned ${name} to the analyst`;
    case 'case.withdraw':
      return `withdrew the submission of ${name}`;
    case 'case.comment':
      return `commented on ${name}`;
    case 'case.attach':
      return `attached a document to ${name}`;
    case 'case.detach':
      return `removed a document from ${name}`;
    case 'case.revise':
      return `started a revision of ${name} (version ${String(e.detail.version ?? '?')})`;
    case 'case.import':
      return `imported cash flows into ${name}`;
    case 'volatility.simulate':
      return `started a Monte Carlo volatility estimate for ${name}`;
    case 'case.cross_check':
      return `started a cross-check of ${name} (version ${String(e.detail.version ?? '?')})`;
    case 'case.cross_check_cancel':
      return 'cancelled a cross-check';
    case 'case.attach_validation_report':
      return `kept the validation report of ${name} (version ${String(e.detail.version ?? '?')}) with its documents`;
    default:
      // An event this list does not know yet reads as words, not as a key.
      return e.action.replace(/[._]/g, ' ');
  }
}

/** The project's audit trail; `initial` is the page's own reading of it, shown before the script. */
export function ActivityList({ projectId, currency, initial }: { projectId: string; currency: string; initial: { activity: Entry[] } }) {
  // Fetched again on mount, as the case table is: SWR's cache may hold an older list.
  const { data, error, isLoading, mutate } = useSWR<{ activity: Entry[] }>(`/api/v1/projects/${projectId}/activity`, getJson, { fallbackData: initial });
  // As in the case table: the page's list is always there, while SWR's isLoading is true as it fetches again.
  if (!data && isLoading) return <LoadingBlock label="Loading activity" lines={3} />;
  if (error || !data) return <LoadError message={error?.message ?? 'No answer from the server.'} onRetry={() => mutate()} />;
  if (data.activity.length === 0) return <p className="text-ink-soft">Nothing has happened here yet.</p>;
  return (
    <ol className="flex flex-col gap-3">
      {data.activity.map((e) => (
        <li key={e.id} className="border-l-2 border-line pl-3">
          <p className="text-body">
            <span className="font-medium">{e.actor ?? 'Someone'}</span> {describe(e, currency)}
          </p>
          <p className="text-caption text-ink-muted">{formatDateTime(e.at)}</p>
        </li>
      ))}
    </ol>
  );
}
