'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { HistogramChart } from '@/components/charts/histogram-chart';
import { FormProblem } from '@/components/form-problem';
import { JobProgress } from '@/components/job-progress';
import { Button } from '@/components/ui/button';
import { getJson, sendJson } from '@/lib/api-client';
import { formatPercent } from '@/lib/format';
import { readNumberText } from '@/lib/number-text';
import type { Distribution, SimulationResult, UncertainLine } from '@/lib/volatility/monte-carlo';

const lineLabels: Record<UncertainLine, string> = { revenue: 'Revenue', operatingCost: 'Operating cost', tax: 'Tax', workingCapital: 'Working capital' };
const distributionLabels: Record<Distribution, string> = { normal: 'Normal', lognormal: 'Lognormal', triangular: 'Triangular', uniform: 'Uniform' };

interface DriverForm {
  on: boolean;
  distribution: Distribution;
  spread: string;
  growth: string;
}

interface Job {
  id: string;
  status: 'running' | 'done' | 'cancelled' | 'failed';
  progress: number;
  result: SimulationResult | null;
  error: string | null;
}

/** A typed figure by the one reading (lib/number-text.ts); one it refuses stops the start, naming the field. */
function typed(raw: string, what: string): number {
  const read = readNumberText(raw);
  if (!read.ok) throw new Error(`${what}: ${read.message}`);
  return read.value;
}

const field = 'h-9 rounded-md border border-line-strong bg-paper-raised px-2';

/**
 * Volatility by Monte Carlo from uncertain lines of the saved cash flows: Copeland & Antikarov's
 * full-path estimate and Brandão, Dyer & Hahn's conditional one, side by side, with a progress bar
 * while the paths run (off the request thread) and a way to cancel.
 */
export function MonteCarloEstimate({ caseId, unsaved, onApply }: { caseId: string; unsaved: boolean; onApply: (volatility: number, note: string) => void }) {
  const [drivers, setDrivers] = useState<Record<UncertainLine, DriverForm>>({
    revenue: { on: true, distribution: 'lognormal', spread: '20', growth: '0' },
    operatingCost: { on: true, distribution: 'triangular', spread: '10', growth: '0' },
    tax: { on: false, distribution: 'normal', spread: '10', growth: '0' },
    workingCapital: { on: false, distribution: 'uniform', spread: '10', growth: '0' },
  });
  // Operating costs usually move with revenue (volume drives both): a positive starting correlation.
  const [correlation, setCorrelation] = useState<Record<string, string>>({ 'revenue|operatingCost': '0.6' });
  const [paths, setPaths] = useState('100000');
  const [seed, setSeed] = useState(() => String(Math.floor(Math.random() * 1_000_000)));
  const [jobId, setJobId] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [starting, setStarting] = useState(false);
  const job = useSWR<Job>(jobId ? `/api/v1/volatility/simulations/${jobId}` : null, getJson, {
    refreshInterval: (latest) => (latest && latest.status !== 'running' ? 0 : 400),
  });

  const chosen = (Object.keys(drivers) as UncertainLine[]).filter((l) => drivers[l].on);
  const pairs = chosen.flatMap((a, i) => chosen.slice(i + 1).map((b) => `${a}|${b}`));

  const start = async () => {
    setProblem(null);
    setStarting(true);
    try {
      const spec = {
        drivers: chosen.map((line) => ({
          line,
          distribution: drivers[line].distribution,
          spread: typed(drivers[line].spread, `${lineLabels[line]} spread`) / 100,
          growth: typed(drivers[line].growth, `${lineLabels[line]} growth`) / 100,
        })),
        correlations: pairs.map((p) => typed(correlation[p] ?? '0', 'Correlation')),
        paths: typed(paths, 'Paths'),
        seed: typed(seed, 'Seed'),
      };
      const { id } = await sendJson<{ id: string }>('POST', '/api/v1/volatility/simulations', { caseId, spec });
      setJobId(id);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The simulation did not start.');
    } finally {
      setStarting(false);
    }
  };

  const cancel = async () => {
    if (!jobId) return;
    try {
      await sendJson('DELETE', `/api/v1/volatility/simulations/${jobId}`);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'Cancelling did not work.');
    }
    await job.mutate();
  };

  const state = job.data;
  // From the click until the job ends: a second click meanwhile would start a second job and lose sight of the first.
  const running = starting || (jobId !== null && (state ? state.status === 'running' : !job.error));
  const result = state?.status === 'done' ? state.result : null;
  const describe = () => chosen.map((l) => `${lineLabels[l].toLowerCase()} ${drivers[l].distribution} ${drivers[l].spread} % a year`).join(', ');

  return (
    <div className="flex flex-col gap-4">
      <table className="w-full border-collapse text-left text-body">
        <caption className="sr-only">Uncertain lines of the cash flows</caption>
        <thead>
          <tr className="text-caption uppercase tracking-wide text-ink-soft">
            <th className="py-1">Uncertain line</th>
            <th className="py-1">Distribution of the annual factor</th>
            <th className="py-1">Spread (% a year)</th>
            <th className="py-1">Extra growth (% a year)</th>
          </tr>
        </thead>
        <tbody>
          {(Object.keys(drivers) as UncertainLine[]).map((line) => {
            const d = drivers[line];
            const set = (patch: Partial<DriverForm>) => setDrivers((all) => ({ ...all, [line]: { ...all[line], ...patch } }));
            return (
              <tr key={line}>
                <td className="py-1">
                  <label className="inline-flex items-center gap-2">
                    <input type="checkbox" checked={d.on} onChange={(e) => set({ on: e.target.checked })} />
                    {lineLabels[line]}
                  </label>
                </td>
                <td className="py-1">
                  <select
                    aria-label={`${lineLabels[line]}: distribution`}
                    value={d.distribution}
                    disabled={!d.on}
                    onChange={(e) => set({ distribution: e.target.value as Distribution })}
                    className={field}
                  >
                    {Object.entries(distributionLabels).map(([k, v]) => (
                      <option key={k} value={k}>
                        {v}
                      </option>
                    ))}
                  </select>
                </td>
                <td className="py-1">
                  <input
                    aria-label={`${lineLabels[line]}: spread`}
                    inputMode="decimal"
                    value={d.spread}
                    disabled={!d.on}
                    onChange={(e) => set({ spread: e.target.value })}
                    className={`${field} w-24 text-right`}
                  />
                </td>
                <td className="py-1">
                  <input
                    aria-label={`${lineLabels[line]}: extra growth`}
                    inputMode="decimal"
                    value={d.growth}
                    disabled={!d.on}
                    onChange={(e) => set({ growth: e.target.value })}
                    className={`${field} w-24 text-right`}
                  />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {pairs.length > 0 ? (
        <div className="flex flex-wrap gap-4">
          {pairs.map((p) => {
            const [a, b] = p.split('|') as [UncertainLine, UncertainLine];
            return (
              <label key={p} className="flex flex-col gap-1">
                <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">
                  Correlation, {lineLabels[a].toLowerCase()} and {lineLabels[b].toLowerCase()}
                </span>
                <input
                  inputMode="decimal"
                  value={correlation[p] ?? '0'}
                  onChange={(e) => setCorrelation((c) => ({ ...c, [p]: e.target.value }))}
                  className={`${field} w-28 text-right`}
                />
              </label>
            );
          })}
        </div>
      ) : null}
      <div className="flex flex-wrap items-end gap-4">
        <label className="flex flex-col gap-1">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Paths</span>
          <input inputMode="numeric" value={paths} onChange={(e) => setPaths(e.target.value)} className={`${field} w-32 text-right`} />
        </label>
        <label className="flex flex-col gap-1">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Seed (same seed, same result)</span>
          <input inputMode="numeric" value={seed} onChange={(e) => setSeed(e.target.value)} className={`${field} w-32 text-right`} />
        </label>
        <Button variant="secondary" onClick={() => void start()} busy={starting} disabled={running || chosen.length === 0}>
          Run the simulation
        </Button>
        {unsaved ? <span className="text-caption text-ember-700">Uses the saved cash flows: save first to include your changes.</span> : null}
      </div>
      <FormProblem message={problem ?? (!state && job.error ? `The simulation's progress could not be read (${(job.error as Error).message}).` : null)} />
      {state ? (
        <div className="flex flex-col gap-2" aria-live="polite">
          <JobProgress
            label="Simulation progress"
            progress={state.progress}
            state={
              state.status === 'running'
                ? `${Math.round(state.progress * 100)} %`
                : state.status === 'done'
                  ? 'Done'
                  : state.status === 'cancelled'
                    ? 'Cancelled'
                    : `Failed: ${state.error}`
            }
            onCancel={state.status === 'running' ? () => void cancel() : undefined}
          />
        </div>
      ) : null}
      {result ? (
        <div className="flex flex-col gap-3 rounded-md border border-line bg-paper p-4">
          <div className="grid grid-cols-[minmax(0,1fr)] gap-4 md:grid-cols-2">
            <div>
              <p className="text-caption uppercase tracking-wide text-ink-muted">Conditional (Brandão, Dyer &amp; Hahn 2005)</p>
              <p className="figures text-title">{formatPercent(result.conditional.volatility)}</p>
              <HistogramChart
                bins={result.conditional.histogram}
                label={`Returns by the conditional method: σ ${formatPercent(result.conditional.volatility)}`}
              />
            </div>
            <div>
              <p className="text-caption uppercase tracking-wide text-ink-muted">Full path (Copeland &amp; Antikarov 2001)</p>
              <p className="figures text-title">{formatPercent(result.fullPath.volatility)}</p>
              <HistogramChart bins={result.fullPath.histogram} label={`Returns by the full-path method: σ ${formatPercent(result.fullPath.volatility)}`} />
            </div>
          </div>
          {result.conditional.excluded + result.fullPath.excluded > 0 ? (
            <p className="rounded-md border border-ember-500 bg-ember-100 px-3 py-2 text-caption text-ember-700">
              {result.conditional.excluded.toLocaleString('en-GB')} paths (conditional) and {result.fullPath.excluded.toLocaleString('en-GB')} (full path) ended
              year 1 with a project value at or below zero, which has no log return; they are left out. Many such paths mean the lognormal lattice fits this
              project poorly: consider smaller spreads or fewer uncertain cost lines.
            </p>
          ) : null}
          <p className="text-caption text-ink-soft">
            Both measure the spread of the first year&rsquo;s return on the project&rsquo;s value over {result.paths.toLocaleString('en-GB')} paths (seed{' '}
            {result.seed}). The full-path method values year 1 from the simulated cash flows of later years, so it counts their uncertainty as if it were
            resolved in the first year and overstates σ; the conditional method values year 1 from the cash flows expected given what is known then. Use the
            conditional figure unless you have a reason not to.
          </p>
          <div>
            <Button
              disabled={!Number.isFinite(result.conditional.volatility)}
              onClick={() =>
                onApply(
                  Number(result.conditional.volatility.toFixed(4)),
                  `Monte Carlo, conditional method (Brandão, Dyer & Hahn 2005): ${result.paths.toLocaleString('en-GB')} paths, seed ${result.seed}; uncertain ${describe()}. Full-path estimate (Copeland & Antikarov) ${formatPercent(result.fullPath.volatility)}. Simulation ${jobId}.`,
                )
              }
            >
              Use {formatPercent(result.conditional.volatility)} for this case
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
