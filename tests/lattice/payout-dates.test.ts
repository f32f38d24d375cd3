/**
 * Value is a continuous function of decision dates for payout schedules that come from the
 * cash-flow model (docs/engine.md §4). The first rule paid each year's cash as one lump on the
 * year's date and let a decision on that date collect it at the new scale: the demo plant's
 * second phase as a European expansion was worth 5.91 at year 3.000 and 2.90 at year 3.083.
 *
 * The check, on the demo models (invented figures): a European right at a payout date d and at
 * d ± one and two months. A value that jumps at d changes more over the month next to d than
 * over the months either side of it; a smooth one changes by about as much (the change itself
 * is genuine: a right's value drifts with its date). So the one-month changes next to d may
 * not exceed the larger of the changes one month further out, plus twice the lattice's own
 * error at that step count, estimated as the spread of V(d) over N, N + 12h, N + 24h and
 * N + 36h steps (its odd-even wobble as nodes cross a strike). Steps are a multiple of 12 a year
 * so no date snaps. Common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type OptionTemplate } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { caseToModel } from '@/lib/case-model';
import type { CaseInput } from '@/lib/validations/case';

const MONTH = 1 / 12;

function premium(input: CaseInput, option: OptionTemplate, steps: number): number {
  const { model } = caseToModel({ ...input, settings: { ...input.settings, steps }, options: [option] });
  const r = valueProject(model, { extras: false });
  return r.expandedNpv - r.staticNpv;
}

const plant = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
const hub = demoPortfolio.find((p) => p.name === 'Cold-storage hub')!.cases[0]!;
const withTiming = (input: CaseInput, timing: 'end-of-year' | 'mid-year'): CaseInput => ({ ...input, cashFlows: { ...input.cashFlows, timing } });

const rights: { name: string; input: CaseInput; option: (at: number) => OptionTemplate; perYear: number }[] = [
  {
    name: 'plant: expand by half for 95',
    input: plant,
    option: (at) => ({ kind: 'expand', factor: 0.5, cost: 95, window: { kind: 'european', at } }),
    perYear: 48,
  },
  { name: 'plant: sell for 70', input: plant, option: (at) => ({ kind: 'abandon', salvage: 70, window: { kind: 'european', at } }), perYear: 48 },
  {
    name: 'plant: contract by 40 % for 45',
    input: plant,
    option: (at) => ({ kind: 'contract', fraction: 0.4, savings: 45, window: { kind: 'european', at } }),
    perYear: 48,
  },
  {
    name: 'hub: build at the date for 92 growing 4 %',
    input: hub,
    option: (at) => ({ kind: 'defer', cost: { amount: 92, growth: 0.04 }, window: { kind: 'bermudan', dates: [at] } }),
    perYear: 36,
  },
];

describe('value is continuous in decision dates (payouts spread over their year)', () => {
  for (const timing of ['end-of-year', 'mid-year'] as const) {
    for (const right of rights) {
      for (const d of [2, 3]) {
        it(`${right.name}, ${timing}, at year ${d} and a month either side`, () => {
          const input = withTiming(right.input, timing);
          const horizon = input.cashFlows.rows.at(-1)!.year;
          const steps = right.perYear * horizon;
          const value = (t: number) => premium(input, right.option(t), steps);
          const [v2, v1, v0, w1, w2] = [d - 2 * MONTH, d - MONTH, d, d + MONTH, d + 2 * MONTH].map(value) as [number, number, number, number, number];
          const nearby = [1, 2, 3].map((k) => premium(input, right.option(d), steps + k * 12 * horizon));
          const latticeError = Math.max(v0, ...nearby) - Math.min(v0, ...nearby);
          const nextToD = Math.max(Math.abs(v0 - v1), Math.abs(w1 - v0));
          const furtherOut = Math.max(Math.abs(v1 - v2), Math.abs(w2 - w1));
          const allowed = furtherOut + 2 * latticeError;
          expect({ values: [v2, v1, v0, w1, w2], nextToD: nextToD <= allowed ? 'no larger' : nextToD, allowed }).toMatchObject({ nextToD: 'no larger' });
        });
      }
    }
  }
});

describe('a payout spread over its period', () => {
  it('leaves the same value at the end of the period as a lump there, so a right on that date is worth the same', () => {
    // Exact by construction: the yield −ln(1 − f) over the period multiplies the value by 1 − f
    // by its end, and a lump on a date belongs to the step that ends there; before the date no
    // decision is open. Tolerance: rounding (1e-12 relative).
    const base = { value: 100, volatility: 0.3 };
    const option: OptionTemplate = { kind: 'abandon', salvage: 80, window: { kind: 'european', at: 1 } };
    const common = { riskFreeRate: 0.04, horizon: 2, steps: 40, options: [option] };
    const spread = valueProject({ ...common, underlying: { ...base, payoutPeriods: [{ from: 0, to: 1, fraction: 0.3 }] } }, { extras: false });
    const lump = valueProject({ ...common, underlying: { ...base, payouts: [{ at: 1, fraction: 0.3 }] } }, { extras: false });
    expect(Math.abs(spread.value - lump.value)).toBeLessThanOrEqual(1e-12 * lump.value);
    // And the right sees the value after the payout: V(1) = 70 on average, so the put is deep.
    expect(spread.value).toBeGreaterThan(100 + 5);
  });
});
