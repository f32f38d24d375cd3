'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { LoadError, LoadingBlock } from '@/components/load-state';
import { Button } from '@/components/ui/button';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { ApiError, getJson, sendJson } from '@/lib/api-client';
import { formatChange, formatDateTime, formatMoney, formatNumber } from '@/lib/format';
import type { FigureChange } from '@/lib/run-changes';

interface Run {
  id: string;
  caseVersion: number;
  engineVersion: string;
  createdAt: string;
  createdBy: string | null;
  resultHash: string;
  expandedNpv: number;
}

interface Outcome {
  runId: string;
  storedEngineVersion: string;
  engineVersion: string;
  storedHash: string;
  resultHash: string;
  reproduced: boolean;
  moved: FigureChange[];
  partsThatDiffer: string[];
}

const short = (hash: string) => hash.slice(0, 12);

function describeChange(c: FigureChange, currency: string): string {
  const isProbability = c.figure.endsWith('probability of use');
  const show = (x: number | null) => (x === null ? 'none' : isProbability ? formatNumber(x, 4) : formatMoney(x, currency, 4));
  // A change below the fourth decimal is still a change: it is written in scientific notation.
  const change =
    c.change === null
      ? ''
      : Math.abs(c.change) < 5e-5
        ? ` (${c.change > 0 ? '+' : ''}${c.change.toExponential(2)})`
        : isProbability
          ? ''
          : ` (${formatChange(c.change, currency, 4)})`;
  return `${c.figure}: ${show(c.stored)} → ${show(c.now)}${change}`;
}

/** The case's stored runs, each of which can be re-run with today's engine to see whether it reproduces. */
export function StoredRuns({ caseId, currency, canRerun }: { caseId: string; currency: string; canRerun: boolean }) {
  const runs = useSWR<{ runs: Run[] }>(`/api/v1/cases/${caseId}/valuations`, getJson, { revalidateOnFocus: false });
  const [busy, setBusy] = useState<string | null>(null);
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  if (runs.isLoading) return <LoadingBlock label="Loading the stored runs" lines={3} />;
  if (runs.error || !runs.data) return <LoadError message={runs.error?.message ?? 'No answer from the server.'} onRetry={() => runs.mutate()} />;
  const rerun = async (id: string) => {
    setBusy(id);
    setProblem(null);
    try {
      setOutcome(await sendJson<Outcome>('POST', `/api/v1/cases/${caseId}/valuations/${id}/rerun`));
    } catch (error) {
      setProblem(error instanceof ApiError ? error.message : 'The re-run did not work; try again.');
    } finally {
      setBusy(null);
    }
  };
  return (
    <section aria-labelledby="stored-runs-heading" className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
      <h3 id="stored-runs-heading" className="text-body font-semibold">
        Stored runs
      </h3>
      <p className="mb-3 text-caption text-ink-muted">
        Every run keeps the model it valued, the engine that valued it and a hash of its result.
        {canRerun ? ' Re-run one to see whether today’s engine reproduces it to the last digit.' : ''}
      </p>
      {runs.data.runs.length === 0 ? (
        <p className="text-ink-soft">No run is stored yet: “Value case” stores one.</p>
      ) : (
        <Table caption="Stored valuation runs">
          <thead>
            <tr>
              <Th>Valued</Th>
              <Th>Version</Th>
              <Th>Engine</Th>
              <Th>Expanded NPV</Th>
              <Th>Result hash</Th>
              {canRerun ? (
                <Th>
                  <span className="sr-only">Actions</span>
                </Th>
              ) : null}
            </tr>
          </thead>
          <tbody>
            {runs.data.runs.slice(0, 10).map((r) => (
              <Tr key={r.id}>
                <Td>
                  {formatDateTime(r.createdAt)}
                  {r.createdBy ? <span className="block text-caption text-ink-muted">{r.createdBy}</span> : null}
                </Td>
                <Td>{r.caseVersion}</Td>
                <Td>
                  <span className="text-caption">{r.engineVersion}</span>
                </Td>
                <Td>{formatMoney(r.expandedNpv, currency)}</Td>
                <Td>
                  <code className="font-mono text-caption" title={r.resultHash}>
                    {short(r.resultHash)}
                  </code>
                </Td>
                {canRerun ? (
                  <Td>
                    <Button
                      variant="quiet"
                      busy={busy === r.id}
                      disabled={busy !== null}
                      onClick={() => void rerun(r.id)}
                      aria-label={`Re-run the run of ${formatDateTime(r.createdAt)}`}
                    >
                      Re-run
                    </Button>
                  </Td>
                ) : null}
              </Tr>
            ))}
          </tbody>
        </Table>
      )}
      {runs.data.runs.length > 10 ? (
        <p className="mt-2 text-caption text-ink-muted">The latest 10 of {runs.data.runs.length} stored runs; the API lists them all.</p>
      ) : null}
      {problem ? (
        <p role="alert" className="mt-3 text-brick-700">
          {problem}
        </p>
      ) : null}
      <div role="status" aria-live="polite">
        {outcome ? (
          outcome.reproduced ? (
            <p className="mt-3 rounded-md bg-tide-50 px-3 py-2 text-tide-700">
              Reproduces: {outcome.engineVersion} gives the identical result (hash {short(outcome.resultHash)}).
            </p>
          ) : (
            <div className="mt-3 rounded-md bg-ember-100 px-3 py-2 text-ember-700">
              <p className="font-medium">
                Does not reproduce: stored by {outcome.storedEngineVersion} (hash {short(outcome.storedHash)}), now {outcome.engineVersion} (hash{' '}
                {short(outcome.resultHash)}).
              </p>
              {outcome.moved.length > 0 ? (
                <ul className="mt-1 list-disc pl-5">
                  {outcome.moved.map((c) => (
                    <li key={c.figure}>{describeChange(c, currency)}</li>
                  ))}
                </ul>
              ) : (
                <p className="mt-1">No headline figure moved.</p>
              )}
              {outcome.partsThatDiffer.length > 0 ? (
                <p className="mt-1 text-caption">Parts of the result that differ: {outcome.partsThatDiffer.join(', ')}.</p>
              ) : null}
            </div>
          )
        ) : null}
      </div>
    </section>
  );
}
