'use client';

import { NumberField } from '@/components/number-field';
import { Select } from '@/components/ui/select';
import { MAX_STEPS } from '@/lattice';
import type { CaseInput } from '@/lib/validations/case';

type CaseSettings = CaseInput['settings'];

const trees = [
  { value: 'crr', label: 'Cox–Ross–Rubinstein (1979)' },
  { value: 'jarrow-rudd', label: 'Jarrow–Rudd (equal probabilities)' },
  { value: 'tian', label: 'Tian (1993, third moment)' },
  { value: 'trigeorgis', label: 'Trigeorgis (1991, log-transformed)' },
];

/** Volatility, the risk-free rate and the lattice's shape: the inputs the valuation rests on beyond the cash flows. */
export function LatticeSettingsSection({
  settings,
  horizon,
  readOnly,
  onChange,
}: {
  settings: CaseSettings;
  horizon: number;
  readOnly: boolean;
  onChange: (s: CaseSettings) => void;
}) {
  const perYear = settings.steps / Math.max(horizon, 1);
  return (
    <div className="grid max-w-3xl gap-6 sm:grid-cols-2">
      <NumberField
        label="Volatility of the project's value"
        percent
        value={settings.volatility}
        readOnly={readOnly}
        hint="Annualised σ of the value's returns: the input committees question most. State its source in the case."
        check={(v) => (v <= 0 ? 'Volatility must be above 0 %.' : v > 3 ? 'Volatility must be at most 300 %.' : null)}
        onChange={(volatility) => onChange({ ...settings, volatility })}
      />
      <NumberField
        label="Risk-free rate"
        percent
        value={settings.riskFreeRate}
        readOnly={readOnly}
        hint="Continuously compounded, a year; e.g. a government bond yield of the project's currency and life."
        check={(v) => (v <= -0.05 || v >= 0.25 ? 'Use a rate between −5 % and 25 %.' : null)}
        onChange={(riskFreeRate) => onChange({ ...settings, riskFreeRate })}
      />
      <NumberField
        label="Lattice steps"
        integer
        value={settings.steps}
        readOnly={readOnly}
        hint={`${perYear.toFixed(1)} steps a year over the ${horizon}-year horizon; more steps, smaller error (see Results → convergence).`}
        check={(v) => (v < 1 || v > MAX_STEPS ? `Use 1 to ${MAX_STEPS.toLocaleString('en-GB')} steps.` : null)}
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
  );
}
