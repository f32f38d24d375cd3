'use client';

import { NumberField } from '@/components/number-field';
import { Select } from '@/components/ui/select';
import { waccSchema, type CashFlowAnalysis, type CashFlowSchedule } from '@/lib/cash-flows';
import { formatMoney, formatPercent } from '@/lib/format';
import { CashFlowGrid } from './cash-flow-grid';
import { timingLabels, type CashFlowTiming } from '@/lib/timing-words';

interface Props {
  cashFlows: CashFlowSchedule;
  analysis: CashFlowAnalysis | null;
  currency: string;
  readOnly: boolean;
  onChange: (cashFlows: CashFlowSchedule) => void;
  onInvalidCount: (count: number) => void;
  /** Workbook template and import controls, shown above the grid. */
  importer?: React.ReactNode;
}

function Derived({ label, value, note }: { label: string; value: string; note: string }) {
  return (
    <div className="rounded-card border border-line bg-paper-raised px-4 py-3 shadow-card">
      <dt className="text-caption font-medium uppercase tracking-wide text-ink-soft">{label}</dt>
      <dd className="figures mt-0.5 text-lead font-semibold">{value}</dd>
      <dd className="text-caption text-ink-muted">{note}</dd>
    </div>
  );
}

/** The case's cash flows: the grid, the discounting conventions, and what the lattice takes from them, all live. */
export function CashFlowSection({ cashFlows, analysis, currency, readOnly, onChange, onInvalidCount, importer }: Props) {
  return (
    <div className="flex flex-col gap-6">
      <div className="flex flex-wrap items-end gap-4">
        <NumberField
          label="WACC"
          percent
          value={cashFlows.wacc}
          schema={waccSchema}
          readOnly={readOnly}
          onChange={(v) => onChange({ ...cashFlows, wacc: v })}
          className="w-40"
        />
        <Select
          label="Cash-flow timing"
          value={cashFlows.timing ?? 'end-of-year'}
          disabled={readOnly}
          onChange={(e) => onChange({ ...cashFlows, timing: e.target.value as CashFlowTiming })}
          options={Object.entries(timingLabels).map(([value, label]) => ({ value, label }))}
          className="w-44"
        />
        <p className="max-w-md pb-1 text-caption text-ink-muted">
          Amounts in {currency}, as entered (the demo uses millions). Year 0 is today and is never discounted.
        </p>
      </div>
      {importer}
      <CashFlowGrid
        rows={cashFlows.rows}
        analysis={analysis}
        readOnly={readOnly}
        onInvalidCount={onInvalidCount}
        onChange={(rows) => onChange({ ...cashFlows, rows })}
      />
      {analysis ? (
        <>
          <dl className="grid grid-cols-[minmax(0,1fr)] gap-4 sm:grid-cols-3">
            <Derived label="NPV at the WACC" value={formatMoney(analysis.npvAtWacc, currency)} note="Σ free cash flow × discount factor" />
            <Derived
              label="Underlying value V₀"
              value={formatMoney(analysis.underlyingValue, currency)}
              note="PV of operating cash flows (before capex): the lattice's start"
            />
            <Derived label="PV of capex" value={formatMoney(analysis.investment, currency)} note="The outlay of the static plan" />
          </dl>
          <section aria-labelledby="payouts-heading">
            <h3 id="payouts-heading" className="text-body font-semibold">
              Payout schedule for the lattice
            </h3>
            <p className="mb-2 text-caption text-ink-muted">
              Each year the project pays out its operating cash flow, a share of the value still to come. The lattice spreads that share over the year, so a
              decision on any date sees the value net of the cash already earned.
            </p>
            {analysis.blank ? (
              <p className="text-ink-soft">
                No figures yet: type or paste each year&rsquo;s revenue, costs and capex above, or import a workbook. The payouts, and the valuation, follow
                from them.
              </p>
            ) : analysis.payouts.length === 0 ? (
              <p className="text-ink-soft">No payouts: no year after year 0 has a positive operating cash flow.</p>
            ) : (
              <ul className="figures flex flex-wrap gap-2">
                {analysis.payouts.map((p) => (
                  <li key={p.at} className="rounded bg-paper-sunk px-2 py-1 text-caption">
                    Year {p.at}: {formatPercent(p.fraction)}
                  </li>
                ))}
              </ul>
            )}
          </section>
          {analysis.warnings.length > 0 ? (
            <ul className="rounded-md border border-ember-500 bg-ember-100 px-4 py-2 text-caption text-ember-700">
              {analysis.warnings.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          ) : null}
        </>
      ) : null}
    </div>
  );
}
