'use client';

import { useState } from 'react';
import { HistoryCharts } from '@/components/charts/history-charts';
import { FormProblem } from '@/components/form-problem';
import { Button } from '@/components/ui/button';
import { sendForm } from '@/lib/api-client';
import { formatPercent } from '@/lib/format';

interface Estimate {
  source: string;
  volatility: number;
  frequency: string;
  observations: number;
  returns: number;
  interval: [number, number];
  first: string;
  last: string;
  warnings: string[];
  series: { date: string; value: number }[];
  logReturns: { date: string; value: number }[];
}

/**
 * Volatility from a history file: upload a CSV or XLSX of dated values, read the estimate with
 * its interval, the detected frequency and the charts, then apply it to the case.
 */
export function HistoryEstimate({ onApply }: { onApply: (volatility: number, note: string) => void }) {
  const [file, setFile] = useState<File | null>(null);
  const [busy, setBusy] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const [estimate, setEstimate] = useState<Estimate | null>(null);

  const run = async () => {
    if (!file) return;
    setBusy(true);
    setProblem(null);
    setEstimate(null);
    try {
      const form = new FormData();
      form.append('file', file);
      setEstimate(await sendForm<Estimate>('/api/v1/volatility/history', form));
    } catch (error) {
      setProblem(error instanceof Error ? error.message : 'The estimate did not work.');
    } finally {
      setBusy(false);
    }
  };

  const note = (e: Estimate) =>
    `From history: ${e.source}, ${e.observations} ${e.frequency} values from ${e.first} to ${e.last}; annualised σ of log returns ${formatPercent(e.volatility)} (95 % interval ${formatPercent(e.interval[0])}–${formatPercent(e.interval[1])}).`;

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <label className="flex flex-col gap-1">
          <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">History file (CSV or XLSX, up to 10 MB)</span>
          <input
            type="file"
            accept=".csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
            onChange={(e) => setFile(e.target.files?.[0] ?? null)}
            className="text-body file:mr-3 file:rounded-md file:border file:border-line-strong file:bg-paper-raised file:px-3 file:py-1.5"
          />
        </label>
        <Button variant="secondary" onClick={() => void run()} busy={busy} disabled={!file}>
          Estimate volatility
        </Button>
      </div>
      <p className="text-caption text-ink-muted">
        Two columns: the date (YYYY-MM-DD, or a date cell) and the value; a first row of labels is fine. Daily, weekly, monthly, quarterly or annual.
      </p>
      <FormProblem message={problem} />
      {estimate ? (
        <div className="flex flex-col gap-3 rounded-md border border-line bg-paper p-4">
          <dl className="figures grid gap-3 sm:grid-cols-4">
            <div>
              <dt className="text-caption uppercase tracking-wide text-ink-muted">Volatility (a year)</dt>
              <dd className="text-title">{formatPercent(estimate.volatility)}</dd>
            </div>
            <div>
              <dt className="text-caption uppercase tracking-wide text-ink-muted">95 % interval</dt>
              <dd>
                {formatPercent(estimate.interval[0])} – {formatPercent(estimate.interval[1])}
              </dd>
            </div>
            <div>
              <dt className="text-caption uppercase tracking-wide text-ink-muted">Frequency found</dt>
              <dd>{estimate.frequency}</dd>
            </div>
            <div>
              <dt className="text-caption uppercase tracking-wide text-ink-muted">Observations</dt>
              <dd>
                {estimate.observations} ({estimate.first} to {estimate.last})
              </dd>
            </div>
          </dl>
          {estimate.warnings.length > 0 ? (
            <ul className="rounded-md border border-ember-500 bg-ember-100 px-3 py-2 text-caption text-ember-700">
              {estimate.warnings.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          ) : null}
          <HistoryCharts series={estimate.series} returns={estimate.logReturns} />
          <div>
            <Button onClick={() => onApply(Number(estimate.volatility.toFixed(4)), note(estimate))}>
              Use {formatPercent(estimate.volatility)} for this case
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
