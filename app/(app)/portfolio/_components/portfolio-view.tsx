'use client';

import Link from 'next/link';
import { useState } from 'react';
import useSWR from 'swr';
import { NpvComparisonChart } from '@/components/charts/npv-comparison-chart';
import { EmptyState } from '@/components/empty-state';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { ENGINE_VERSION } from '@/lattice';
import { getJson } from '@/lib/api-client';
import { formatMoney } from '@/lib/format';
import type { ProjectSummaryJson } from '@/lib/project-summary';
import { PortfolioTable } from './portfolio-table';
import { RevaluePortfolio } from './revalue-portfolio';
import { DownloadLink } from '@/components/ui/download-link';

function Figure({ label, value, note }: { label: string; value: string; note?: string }) {
  return (
    <div className="rounded-card border border-line bg-paper-raised px-5 py-4 shadow-card">
      <p className="text-caption font-medium uppercase tracking-wide text-ink-soft">{label}</p>
      <p className="figures mt-1 text-title">{value}</p>
      {note ? <p className="mt-1 text-caption text-ink-muted">{note}</p> : null}
    </div>
  );
}

export function PortfolioView({ canCreate }: { canCreate: boolean }) {
  const { data, error, isLoading, mutate } = useSWR<{ projects: ProjectSummaryJson[] }>('/api/v1/projects', getJson);
  // Once a re-valuation starts, its progress and outcome stay on screen after the figures are current.
  const [revaluing, setRevaluing] = useState(false);
  if (isLoading) return <LoadingBlock label="Loading the portfolio" lines={6} />;
  if (error || !data) return <LoadError message={error?.message ?? 'No answer from the server.'} onRetry={() => mutate()} />;
  const projects = data.projects;
  if (projects.length === 0)
    return (
      <EmptyState title="No projects yet">
        {canCreate ? (
          <>
            Start with{' '}
            <Link href="/projects" className="text-tide-600 underline">
              a new project
            </Link>
            : enter its cash flows, attach its options and value it.
          </>
        ) : (
          'When analysts value a project, it appears here with its static NPV, option premium and expanded NPV.'
        )}
      </EmptyState>
    );
  const valued = projects.filter((p) => p.latest && p.status === 'active');
  const currencies = [...new Set(valued.map((p) => p.currency))];
  const oneCurrency = currencies.length === 1 ? currencies[0] : undefined;
  const total = (key: 'staticNpv' | 'optionPremium' | 'expandedNpv') => valued.reduce((s, p) => s + p.latest![key], 0);
  const mixed = 'Projects use more than one currency; see each row.';
  const stale = projects.some((p) => p.latest && p.latest.engineVersion !== ENGINE_VERSION);
  return (
    <div className="flex flex-col gap-8">
      {canCreate && (stale || revaluing) ? <RevaluePortfolio onStarted={() => setRevaluing(true)} onFinished={() => void mutate()} /> : null}
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 sm:grid-cols-2 xl:grid-cols-4">
        <Figure label="Active projects valued" value={`${valued.length} of ${projects.filter((p) => p.status === 'active').length}`} />
        <Figure
          label="Static NPV, total"
          value={oneCurrency ? formatMoney(total('staticNpv'), oneCurrency) : '–'}
          note={oneCurrency ? 'Without flexibility' : mixed}
        />
        <Figure
          label="Option premium, total"
          value={oneCurrency ? formatMoney(total('optionPremium'), oneCurrency) : '–'}
          note={oneCurrency ? 'The value of the rights management holds' : mixed}
        />
        <Figure
          label="Expanded NPV, total"
          value={oneCurrency ? formatMoney(total('expandedNpv'), oneCurrency) : '–'}
          note={oneCurrency ? 'Static NPV + option premium' : mixed}
        />
      </div>
      {oneCurrency && valued.length > 1 ? (
        <p className="-mt-5 text-caption text-ink-muted">
          Totals add the unrounded figures, so one can differ slightly from the sum of the rounded rows below.
        </p>
      ) : null}
      <section aria-labelledby="portfolio-table">
        <div className="mb-3 flex flex-wrap items-baseline justify-between gap-3">
          <h2 id="portfolio-table">Projects</h2>
          <p className="text-caption text-ink-soft">
            Approved figures per project:{' '}
            <DownloadLink href="/api/v1/portfolio.csv" className="text-tide-600 underline">
              CSV
            </DownloadLink>{' '}
            ·{' '}
            <DownloadLink href="/api/v1/portfolio.xlsx" className="text-tide-600 underline">
              Workbook
            </DownloadLink>
          </p>
        </div>
        <PortfolioTable projects={projects} />
      </section>
      {valued.length > 0 ? (
        <section aria-labelledby="portfolio-chart" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <h2 id="portfolio-chart" className="mb-1">
            NPV with and without flexibility
          </h2>
          <p className="mb-4 text-caption text-ink-muted">
            Latest valuation of each active project{oneCurrency ? `, ${oneCurrency}` : ''}; the bar is the option premium.
          </p>
          <NpvComparisonChart
            title="Per project"
            currency={oneCurrency}
            items={valued.map((p) => ({ id: p.id, label: p.name, staticNpv: p.latest!.staticNpv, expandedNpv: p.latest!.expandedNpv }))}
          />
        </section>
      ) : null}
    </div>
  );
}
