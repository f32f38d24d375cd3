'use client';

import Link from 'next/link';
import useSWR from 'swr';
import { EmptyState } from '@/components/empty-state';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { OlderEngineNote } from '@/components/older-engine-note';
import { getJson } from '@/lib/api-client';
import { formatDate, formatMoney } from '@/lib/format';
import type { ProjectSummaryJson } from '@/lib/project-summary';

/** Every project of the organisation as a card: what it is, its cases and its base case's figures. */
export function ProjectList({ canCreate }: { canCreate: boolean }) {
  const { data, error, isLoading, mutate } = useSWR<{ projects: ProjectSummaryJson[] }>('/api/v1/projects', getJson);
  if (isLoading) return <LoadingBlock label="Loading projects" />;
  if (error || !data) return <LoadError message={error?.message ?? 'No answer from the server.'} onRetry={() => mutate()} />;
  if (data.projects.length === 0)
    return (
      <EmptyState title="No projects yet">
        {canCreate ? 'Create the first one with “New project”: a name is enough to start.' : 'Projects created by your analysts will be listed here.'}
      </EmptyState>
    );
  return (
    <ul className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-2">
      {data.projects.map((p) => (
        <li key={p.id}>
          <Link
            href={`/projects/${p.id}`}
            className="block h-full rounded-card border border-line bg-paper-raised p-5 shadow-card transition-colors hover:border-tide-300 focus-visible:border-tide-500"
          >
            <div className="flex items-start justify-between gap-4">
              <h2 className="text-tide-700">{p.name}</h2>
              {p.status === 'archived' ? <span className="rounded bg-paper-sunk px-2 py-0.5 text-caption text-ink-soft">Archived</span> : null}
            </div>
            <p className="mt-1 line-clamp-2 text-ink-soft">{p.description || 'No description yet.'}</p>
            <dl className="figures mt-4 grid grid-cols-3 gap-2 text-body">
              <div>
                <dt className="text-caption uppercase tracking-wide text-ink-muted">Static NPV</dt>
                <dd>{formatMoney(p.latest?.staticNpv, p.currency)}</dd>
              </div>
              <div>
                <dt className="text-caption uppercase tracking-wide text-ink-muted">Option premium</dt>
                <dd>{formatMoney(p.latest?.optionPremium, p.currency)}</dd>
              </div>
              <div>
                <dt className="text-caption uppercase tracking-wide text-ink-muted">Expanded NPV</dt>
                <dd className="font-semibold">{formatMoney(p.latest?.expandedNpv, p.currency)}</dd>
              </div>
            </dl>
            <p className="mt-3 text-caption text-ink-muted">
              {p.caseCount} {p.caseCount === 1 ? 'case' : 'cases'} · {p.ownerName ?? 'no owner'} ·{' '}
              {p.latest
                ? `base case v${p.latest.caseVersion} valued ${formatDate(p.latest.valuedAt)}${p.latest.caseVersion < p.latest.currentVersion ? ' (edited since)' : ''}`
                : 'not valued yet'}
              <OlderEngineNote engineVersion={p.latest?.engineVersion} />
            </p>
          </Link>
        </li>
      ))}
    </ul>
  );
}
