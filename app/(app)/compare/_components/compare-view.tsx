'use client';

import Link from 'next/link';
import { usePathname, useSearchParams } from 'next/navigation';
import { useState } from 'react';
import useSWR from 'swr';
import { NpvComparisonChart } from '@/components/charts/npv-comparison-chart';
import { EmptyState } from '@/components/empty-state';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { ValuationCaution } from '@/components/valuation-caution';
import { OlderEngineNote } from '@/components/older-engine-note';
import { getJson } from '@/lib/api-client';
import { DownloadLink } from '@/components/ui/download-link';

interface CaseOption {
  id: string;
  name: string;
  status: string;
  projectId: string;
  projectName: string;
}

interface ComparisonJson {
  cases: {
    id: string;
    projectName: string;
    caseName: string;
    currency: string;
    staticNpv: number | null;
    expandedNpv: number | null;
    valuedAt: string | null;
    figuresVersion: number | null;
    engineVersion: string | null;
    version: number;
  }[];
  rows: { group: string; label: string; values: (string | null)[]; differs: boolean }[];
}

const MAX = 4;

/** An organisation with no case, or one: nothing to compare yet, and the way to a second case. */
function TooFewCases({ only, canCreate }: { only: CaseOption | undefined; canCreate: boolean }) {
  if (!only)
    return (
      <EmptyState title="No cases to compare yet">
        {canCreate ? (
          <>
            A comparison needs two cases. Start with{' '}
            <Link href="/projects" className="text-tide-600 underline">
              a new project
            </Link>{' '}
            and give it two cases, a base case and a variant.
          </>
        ) : (
          'When analysts have made two cases, you can set them side by side here.'
        )}
      </EmptyState>
    );
  return (
    <EmptyState title="One case so far">
      A comparison needs two cases; “{only.name}” of {only.projectName} is the only one.{' '}
      {canCreate ? (
        <>
          Duplicate it on{' '}
          <Link href={`/projects/${only.projectId}`} className="text-tide-600 underline">
            its project’s page
          </Link>{' '}
          and change what you want to weigh.
        </>
      ) : (
        'When analysts make another, you can set them side by side here.'
      )}
    </EmptyState>
  );
}

/**
 * Two to four cases side by side. The selection lives in the URL (?cases=…), so a comparison can
 * be shared by sending the link; rows where the cases differ are marked in words and by tone.
 */
export function CompareView({ canCreate }: { canCreate: boolean }) {
  const pathname = usePathname();
  const params = useSearchParams();
  const selected = (params.get('cases') ?? '').split(',').filter(Boolean).slice(0, MAX);
  const all = useSWR<{ cases: CaseOption[] }>('/api/v1/cases', getJson);
  const query = selected.length >= 2 ? `/api/v1/compare?cases=${selected.join(',')}` : null;
  const comparison = useSWR<ComparisonJson>(query, getJson);
  const [onlyDifferences, setOnlyDifferences] = useState(false);
  const shownRows = (comparison.data?.rows ?? []).filter((r) => r.differs || !onlyDifferences);

  const toggle = (id: string) => {
    const next = selected.includes(id) ? selected.filter((x) => x !== id) : [...selected, id].slice(0, MAX);
    // The address changes in the browser only: Next.js syncs useSearchParams with it at once, where
    // router.replace would wait for the server, leaving the box unticked meanwhile and a second tick,
    // read from the old address, dropping the first (seen with 400 ms of latency).
    window.history.replaceState(null, '', next.length ? `${pathname}?cases=${next.join(',')}` : pathname);
  };

  if (all.isLoading) return <LoadingBlock label="Loading cases" />;
  if (all.error || !all.data) return <LoadError message={all.error?.message ?? 'No answer from the server.'} onRetry={() => all.mutate()} />;
  const projects = [...new Map(all.data.cases.map((c) => [c.projectId, c.projectName])).entries()];
  if (all.data.cases.length < 2) return <TooFewCases only={all.data.cases[0]} canCreate={canCreate} />;

  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-8 xl:grid-cols-[18rem_minmax(0,1fr)]">
      <fieldset className="rounded-card border border-line bg-paper-raised p-4 shadow-card">
        <legend className="px-1 text-caption font-medium uppercase tracking-wide text-ink-soft">
          Cases to compare ({selected.length} of up to {MAX})
        </legend>
        {projects.map(([projectId, projectName]) => (
          <div key={projectId} className="mb-3">
            <p className="text-caption font-semibold text-ink">{projectName}</p>
            {all
              .data!.cases.filter((c) => c.projectId === projectId)
              .map((c) => (
                <label key={c.id} className="flex items-center gap-2 py-0.5 text-body">
                  <input
                    type="checkbox"
                    value={c.id}
                    checked={selected.includes(c.id)}
                    disabled={!selected.includes(c.id) && selected.length >= MAX}
                    onChange={() => toggle(c.id)}
                  />
                  {c.name}
                </label>
              ))}
          </div>
        ))}
      </fieldset>
      <div className="flex min-w-0 flex-col gap-6">
        {selected.length < 2 ? (
          <p className="rounded-card border border-dashed border-line-strong bg-paper-raised px-6 py-10 text-center text-ink-soft">
            Choose two to four cases, from one project or several. The page address then names them, so you can send it to a colleague.
          </p>
        ) : comparison.isLoading ? (
          <LoadingBlock label="Comparing" lines={8} />
        ) : comparison.error || !comparison.data ? (
          <LoadError message={comparison.error?.message ?? 'No answer from the server.'} onRetry={() => comparison.mutate()} />
        ) : (
          <>
            <div className="flex flex-wrap items-center justify-between gap-3">
              <p className="text-caption text-ink-muted">
                Figures from each case&rsquo;s latest stored valuation; inputs as typed. Rows marked “differs” are not the same in every case; cells unlike the
                first case are tinted. {comparison.data.rows.filter((r) => r.differs).length} of {comparison.data.rows.length} rows differ.
              </p>
              <label className="flex items-center gap-2 text-body">
                <input type="checkbox" checked={onlyDifferences} onChange={(e) => setOnlyDifferences(e.target.checked)} className="h-4 w-4" />
                Only rows that differ
              </label>
              <DownloadLink
                href={`/api/v1/compare.xlsx?cases=${selected.join(',')}`}
                className="inline-flex items-center rounded-md border border-line-strong bg-paper-raised px-4 py-2 font-medium hover:bg-paper-sunk"
              >
                Download as a workbook
              </DownloadLink>
            </div>
            <div className="relative overflow-x-auto rounded-card border border-line bg-paper-raised shadow-card">
              <table className="w-full border-collapse text-left text-body">
                <caption className="sr-only">Cases side by side</caption>
                <thead>
                  <tr>
                    <th scope="col" className="border-b border-line bg-paper-sunk px-4 py-2 text-caption uppercase tracking-wide text-ink-soft">
                      &nbsp;
                    </th>
                    {comparison.data.cases.map((c) => (
                      <th key={c.id} scope="col" className="border-b border-line bg-paper-sunk px-4 py-2 align-bottom">
                        <span className="block text-caption text-ink-muted">{c.projectName}</span>
                        <span className="font-semibold">{c.caseName}</span>
                        <span className="block text-caption font-normal text-ink-muted">
                          {c.figuresVersion === null
                            ? 'not valued yet'
                            : `figures of v${c.figuresVersion}${c.figuresVersion < c.version ? ` (now v${c.version}, not yet valued)` : ''}`}
                        </span>
                        <OlderEngineNote engineVersion={c.engineVersion} />
                      </th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {shownRows.map((row, k) => (
                    <tr key={`${row.group}:${row.label}`} className={k > 0 && shownRows[k - 1]!.group !== row.group ? 'border-t-2 border-line-strong' : ''}>
                      <th scope="row" className="border-b border-line px-4 py-2 text-left font-normal">
                        {k === 0 || shownRows[k - 1]!.group !== row.group ? (
                          <span className="block text-caption uppercase tracking-wide text-ink-muted">{row.group}</span>
                        ) : null}
                        {row.label}
                        {row.differs ? <span className="ml-2 rounded bg-ember-100 px-1.5 text-caption font-medium text-ember-700">differs</span> : null}
                      </th>
                      {row.values.map((v, j) => (
                        <td key={j} className={`figures border-b border-line px-4 py-2 ${j > 0 && v !== row.values[0] ? 'bg-tide-50 font-semibold' : ''}`}>
                          {v ?? <span className="text-ink-muted">–</span>}
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
            <section className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
              <h2 className="mb-3">NPV with and without flexibility</h2>
              <NpvComparisonChart
                title="Per case"
                currency={new Set(comparison.data.cases.map((c) => c.currency)).size === 1 ? comparison.data.cases[0]!.currency : undefined}
                items={comparison.data.cases
                  .filter((c) => c.staticNpv !== null && c.expandedNpv !== null)
                  .map((c) => ({ id: c.id, label: `${c.caseName} (${c.projectName})`, staticNpv: c.staticNpv!, expandedNpv: c.expandedNpv! }))}
              />
            </section>
            <ValuationCaution />
          </>
        )}
      </div>
    </div>
  );
}
