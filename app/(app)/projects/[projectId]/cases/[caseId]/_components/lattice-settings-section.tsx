'use client';

import { Panel } from '@/components/panel';
import { NumberField } from '@/components/number-field';
import { Select } from '@/components/ui/select';
import { MAX_STEPS } from '@/lattice';
import { caseSettingsSchema, type CaseInput } from '@/lib/validations/case';
import { volatilityMethodLabels as methodLabels } from '@/lib/volatility/method-words';
import { treeLabels } from '@/lib/tree-words';
import { HistoryEstimate } from './history-estimate';
import { MonteCarloEstimate } from './monte-carlo-estimate';

type CaseSettings = CaseInput['settings'];

const trees = Object.entries(treeLabels).map(([value, label]) => ({ value, label }));

/**
 * The inputs the valuation rests on beyond the cash flows: the volatility (entered with its
 * justification, or estimated from a history file), the risk-free rate and the lattice's shape.
 */
export function LatticeSettingsSection({
  caseId,
  unsaved,
  settings,
  horizon,
  readOnly,
  onChange,
  maxSteps = MAX_STEPS,
}: {
  caseId: string;
  unsaved: boolean;
  settings: CaseSettings;
  horizon: number;
  readOnly: boolean;
  onChange: (s: CaseSettings) => void;
  /** The most steps the engine's budget allows for a full valuation of this case with its rights. */
  maxSteps?: number;
}) {
  const perYear = settings.steps / Math.max(horizon, 1);
  const source = settings.volatilitySource;
  return (
    <div className="flex max-w-5xl flex-col gap-6">
      <Panel
        title="Volatility of the project's value"
        note="The annualised σ of the value's returns: the input committees question most. Say where it comes from."
      >
        <div className="grid grid-cols-[minmax(0,1fr)] gap-6 md:grid-cols-[16rem_minmax(0,1fr)]">
          <NumberField
            label="Volatility"
            percent
            value={settings.volatility}
            readOnly={readOnly}
            schema={caseSettingsSchema.shape.volatility}
            onChange={(volatility) => onChange({ ...settings, volatility, volatilitySource: { method: 'direct', note: source?.note ?? '' } })}
          />
          <label className="flex flex-col gap-1">
            <span className="text-caption font-medium uppercase tracking-wide text-ink-soft">Justification · {methodLabels[source?.method ?? 'direct']}</span>
            <textarea
              value={source?.note ?? ''}
              readOnly={readOnly}
              maxLength={2000}
              rows={3}
              placeholder="e.g. Implied volatility of listed resin producers, 2019–2024, adjusted for leverage."
              onChange={(e) => onChange({ ...settings, volatilitySource: { method: source?.method ?? 'direct', note: e.target.value } })}
              className="rounded-md border border-line-strong bg-paper-raised px-3 py-2"
            />
          </label>
        </div>
      </Panel>
      {readOnly ? null : (
        <Panel
          title="Estimate from history"
          note="Upload a price or value history (a comparable's share price, a commodity, a past project's value); Leeway annualises the volatility of its log returns."
        >
          <HistoryEstimate onApply={(volatility, note) => onChange({ ...settings, volatility, volatilitySource: { method: 'history', note } })} />
        </Panel>
      )}
      {readOnly ? null : (
        <Panel
          title="Estimate by Monte Carlo from the cash flows"
          note="Mark the lines of the cash flows that are uncertain; Leeway simulates them and measures the spread of the project value's first-year return (the consolidated-uncertainty approach)."
        >
          <MonteCarloEstimate
            caseId={caseId}
            unsaved={unsaved}
            onApply={(volatility, note) => onChange({ ...settings, volatility, volatilitySource: { method: 'monte-carlo', note } })}
          />
        </Panel>
      )}
      <Panel title="Rates and lattice">
        <div className="grid grid-cols-[minmax(0,1fr)] gap-6 sm:grid-cols-3">
          <NumberField
            label="Risk-free rate"
            percent
            value={settings.riskFreeRate}
            readOnly={readOnly}
            hint="Continuously compounded, a year; e.g. a government bond yield of the project's currency and life."
            schema={caseSettingsSchema.shape.riskFreeRate}
            onChange={(riskFreeRate) => onChange({ ...settings, riskFreeRate })}
          />
          <NumberField
            label="Lattice steps"
            integer
            value={settings.steps}
            readOnly={readOnly}
            hint={`${perYear.toFixed(1)} steps a year over the ${horizon}-year horizon; more steps, smaller error (see Results → convergence).`}
            schema={caseSettingsSchema.shape.steps}
            check={(v) => (v > maxSteps ? `Use at most ${maxSteps.toLocaleString('en-GB')} steps: the most a full valuation with these rights may use.` : null)}
            onChange={(steps) => onChange({ ...settings, steps })}
          />
          <Select
            label="Tree"
            value={settings.tree ?? 'crr'}
            disabled={readOnly}
            options={trees}
            onChange={(e) => onChange({ ...settings, tree: e.target.value as CaseSettings['tree'] })}
          />
        </div>
      </Panel>
    </div>
  );
}
