'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { FieldProblems } from '@/components/field-problems';
import { FormProblem } from '@/components/form-problem';
import { JobProgress } from '@/components/job-progress';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { NumberField } from '@/components/number-field';
import { Button } from '@/components/ui/button';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { ApiError, getJson, sendJson } from '@/lib/api-client';
import { PATH_LIMITS } from '@/lib/cross-check/limits';
import type { CrossCheckResult } from '@/lib/cross-check/run';
import { crossCheckStartSchema } from '@/lib/validations/cross-check';
import { formatDateTime, formatMoney, formatPercent } from '@/lib/format';

interface CrossCheck {
  id: string;
  caseVersion: number;
  engineVersion: string;
  paths: number;
  seed: number;
  status: 'running' | 'done' | 'cancelled' | 'failed';
  progress: number;
  result: CrossCheckResult | null;
  error: string | null;
  createdAt: string;
}

const pathsSchema = crossCheckStartSchema.shape.paths.unwrap();

const ignoreProblem = () => {};

function Verdict({ result, currency }: { result: CrossCheckResult; currency: string }) {
  const { verdict, lattice, monteCarlo } = result;
  const money = (x: number) => formatMoney(x, currency, 2);
  const range = (r: { low: number; high: number }) => `${money(r.low)} to ${money(r.high)}`;
  const differing = verdict.rights.filter((r) => r.differs);
  return (
    <div className="flex flex-col gap-3">
      {verdict.agrees ? (
        <p className="rounded-md bg-tide-50 px-3 py-2 text-tide-700">
          <span className="font-medium">Agrees.</span> The lattice’s band ({range(verdict.latticeRange)}) meets the Monte Carlo’s range (
          {range(verdict.monteCarloRange)}).
        </p>
      ) : (
        <p className="rounded-md border border-ember-500 bg-ember-100 px-3 py-2 text-ember-700">
          <span className="font-medium">Disagrees by {money(verdict.gap)}.</span> The lattice’s band ({range(verdict.latticeRange)}) lies outside the Monte
          Carlo’s range ({range(verdict.monteCarloRange)}); the lattice is {money(Math.abs(verdict.difference))} {verdict.difference > 0 ? 'above' : 'below'}{' '}
          the middle of its two estimates. Check the model’s conventions before relying on either figure.
        </p>
      )}
      {differing.length > 0 ? (
        <p className="text-ember-700">
          Used with a different probability:{' '}
          {differing.map((r) => `“${r.id}” (lattice ${formatPercent(r.lattice)}, Monte Carlo ${formatPercent(r.monteCarlo)})`).join(', ')}.
        </p>
      ) : null}
      <Table caption="The lattice and the Monte Carlo, expanded NPV">
        <thead>
          <tr>
            <Th>Method</Th>
            <Th numeric>Expanded NPV</Th>
            <Th numeric>Standard error</Th>
            <Th>What it is</Th>
          </tr>
        </thead>
        <tbody>
          <Tr>
            <Td>Lattice, {lattice.steps} steps</Td>
            <Td numeric>{money(lattice.expandedNpv)}</Td>
            <Td numeric>—</Td>
            <Td>Convergence band {lattice.band ? range(lattice.band) : 'not available (no coarser step count keeps every date)'}</Td>
          </Tr>
          <Tr>
            <Td>Monte Carlo, fresh paths</Td>
            <Td numeric>{money(monteCarlo.lowBiased.expandedNpv)}</Td>
            <Td numeric>{money(monteCarlo.lowBiased.standardError)}</Td>
            <Td>The fitted rule on paths it has not seen: biased down</Td>
          </Tr>
          <Tr>
            <Td>Monte Carlo, fitting paths</Td>
            <Td numeric>{money(monteCarlo.highBiased.expandedNpv)}</Td>
            <Td numeric>{money(monteCarlo.highBiased.standardError)}</Td>
            <Td>The fitted rule on the paths it was fitted to: biased up</Td>
          </Tr>
        </tbody>
      </Table>
      {verdict.rights.length > 0 ? (
        <Table caption="How often each right is used">
          <thead>
            <tr>
              <Th>Right</Th>
              <Th numeric>Lattice</Th>
              <Th numeric>Monte Carlo</Th>
              <Th numeric>± standard error</Th>
            </tr>
          </thead>
          <tbody>
            {verdict.rights.map((r) => (
              <Tr key={r.id}>
                <Td>
                  {r.id}
                  {r.differs ? <span className="ml-2 text-caption text-ember-700">differs</span> : null}
                </Td>
                <Td numeric>{formatPercent(r.lattice)}</Td>
                <Td numeric>{formatPercent(r.monteCarlo)}</Td>
                <Td numeric>{formatPercent(r.standardError)}</Td>
              </Tr>
            ))}
          </tbody>
        </Table>
      ) : null}
      <p className="text-caption text-ink-muted">
        {monteCarlo.paths.toLocaleString('en-GB')} paths in each pass, seed {monteCarlo.seed}, {monteCarlo.dates} decision dates (the lattice’s own),{' '}
        {result.seconds.toFixed(1)} s; lattice by {lattice.engineVersion}.
      </p>
    </div>
  );
}

/**
 * The case's cross-checks (docs/engine.md §11): an independent least-squares Monte Carlo of the
 * saved version, queued as a job, compared with the lattice's value and convergence band.
 */
export function CrossCheckPanel({ caseId, currency, canStart, unsaved }: { caseId: string; currency: string; canStart: boolean; unsaved: boolean }) {
  const list = useSWR<{ crossChecks: CrossCheck[] }>(`/api/v1/cases/${caseId}/cross-checks`, getJson, {
    refreshInterval: (latest) => (latest?.crossChecks.some((c) => c.status === 'running') ? 1000 : 0),
    revalidateOnFocus: false,
  });
  const [paths, setPaths] = useState<number>(PATH_LIMITS.default);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  if (list.isLoading) return <LoadingBlock label="Loading the cross-checks" lines={3} />;
  if (list.error || !list.data) return <LoadError message={list.error?.message ?? 'No answer from the server.'} onRetry={() => list.mutate()} />;
  const [latest, ...older] = list.data.crossChecks;
  const running = latest?.status === 'running';

  const start = async () => {
    setBusy(true);
    setProblem(null);
    try {
      await sendJson('POST', `/api/v1/cases/${caseId}/cross-checks`, { paths });
      await list.mutate();
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'The cross-check did not start; try again.');
    } finally {
      setBusy(false);
    }
  };
  const cancel = async (id: string) => {
    setProblem(null);
    try {
      await sendJson('DELETE', `/api/v1/cases/${caseId}/cross-checks/${id}`);
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'Cancelling did not work; try again.');
    }
    await list.mutate();
  };

  return (
    <section aria-labelledby="cross-check-heading" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
      <h3 id="cross-check-heading" className="text-body font-semibold">
        Independent cross-check
      </h3>
      <p className="mb-3 text-caption text-ink-muted">
        A least-squares Monte Carlo (Longstaff &amp; Schwartz 2001), written apart from the lattice, values the saved version again on simulated paths and says
        whether the two methods agree within their stated errors.
      </p>
      {canStart ? (
        <div className="mb-4 flex flex-wrap items-end gap-4">
          {/* Not a field of the case: its problems are its own, never the case form's (which would then not save). */}
          <FieldProblems.Provider value={ignoreProblem}>
            <NumberField label="Cross-check paths (each pass)" value={paths} onChange={setPaths} integer schema={pathsSchema} className="w-40" />
          </FieldProblems.Provider>
          <Button variant="secondary" busy={busy} disabled={busy || running || !pathsSchema.safeParse(paths).success} onClick={() => void start()}>
            Cross-check
          </Button>
          {unsaved ? <span className="text-caption text-ember-700">Checks the saved version: save first to include your changes.</span> : null}
        </div>
      ) : null}
      <FormProblem message={problem} />
      <div aria-live="polite" className="flex flex-col gap-3">
        {!latest ? (
          <p className="text-ink-soft">No cross-check yet.{canStart ? ' “Cross-check” runs one on the queue; it takes a few seconds to a minute.' : ''}</p>
        ) : (
          <>
            <p className="text-caption text-ink-muted">
              Version {latest.caseVersion}, started {formatDateTime(latest.createdAt)}
            </p>
            {latest.status === 'running' ? (
              <JobProgress
                label="Cross-check progress"
                progress={latest.progress}
                state={latest.progress > 0 ? `${Math.round(latest.progress * 100)} %` : 'Waiting for a worker'}
                onCancel={canStart ? () => void cancel(latest.id) : undefined}
              />
            ) : null}
            {latest.status === 'failed' ? <p className="text-brick-700">Failed: {latest.error}</p> : null}
            {latest.status === 'cancelled' ? <p className="text-ink-soft">Cancelled.</p> : null}
            {latest.result ? <Verdict result={latest.result} currency={currency} /> : null}
          </>
        )}
      </div>
      {older.length > 0 ? (
        <details className="mt-4">
          <summary className="cursor-pointer text-caption font-medium">Earlier cross-checks ({older.length})</summary>
          <ul className="mt-2 flex flex-col gap-1 text-caption">
            {older.map((c) => (
              <li key={c.id}>
                {formatDateTime(c.createdAt)}, version {c.caseVersion}, {c.paths.toLocaleString('en-GB')} paths:{' '}
                {c.result ? (c.result.verdict.agrees ? 'agreed' : `disagreed by ${formatMoney(c.result.verdict.gap, currency, 2)}`) : c.status}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </section>
  );
}
