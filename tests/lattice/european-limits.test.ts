/**
 * European limits: a defer or abandon right exercisable only at the horizon is a European call
 * or put on V. Compared with the `black-scholes` npm package (Black & Scholes 1973; no payout
 * yield there, so δ = 0). The binomial European error is O(1/N); at 2000 steps the tolerance is
 * 0.005 on prices of 5 to 30 (measured: at most 0.0027, for S = 90, K = 110, T = 3, σ = 0.4, where
 * CRR's odd–even oscillation is largest).
 */
import { createRequire } from 'node:module';
import { describe, it } from 'vitest';
import { valueProject, type ProjectModel } from '@/lattice';
import { expectClose } from './support/check';
import { normalCdf, normalPdf } from './support/normal';

const require = createRequire(import.meta.url);
const { blackScholes } = require('black-scholes') as {
  blackScholes: (s: number, k: number, t: number, v: number, r: number, callPut: 'call' | 'put') => number;
};

const cases = [
  { S: 100, K: 100, T: 1, sigma: 0.2, r: 0.05 },
  { S: 90, K: 110, T: 3, sigma: 0.4, r: 0.03 },
  { S: 130, K: 100, T: 0.5, sigma: 0.3, r: 0.07 },
];

describe('European limits converge to Black–Scholes', () => {
  it.each(cases)('S=$S K=$K T=$T σ=$sigma r=$r', ({ S, K, T, sigma, r }) => {
    const common = { underlying: { value: S, volatility: sigma }, riskFreeRate: r, horizon: T, steps: 2000 };
    const call: ProjectModel = { ...common, options: [{ kind: 'defer', cost: K, window: { kind: 'european', at: T } }] };
    const put: ProjectModel = { ...common, options: [{ kind: 'abandon', salvage: K, window: { kind: 'european', at: T } }] };
    expectClose(valueProject(call, { extras: false }).value, blackScholes(S, K, T, sigma, r, 'call'), { abs: 0.005 }, { S, K, T, sigma, r });
    expectClose(valueProject(put, { extras: false }).value - S, blackScholes(S, K, T, sigma, r, 'put'), { abs: 0.005 }, { S, K, T, sigma, r });
  });
});

describe('sensitivities in the European limit', () => {
  // Each end of the V0 and σ rows is the expanded NPV with that input moved, so for a European
  // call it must be the Black–Scholes price at that input (the same 0.005 at 2000 steps). The
  // central difference of the V0 row is then Black–Scholes' own delta estimate over ±10 %, and
  // the σ row's its vega estimate; checked here against the closed forms N(d1) and S·φ(d1)·√T
  // (Black & Scholes 1973) within the finite difference's own error: for a bump h the central
  // difference differs from the derivative by about f'''·h²/6, bounded here by evaluating that
  // difference on the closed-form price itself.
  it.each(cases)('V0 and σ rows of a call: S=$S K=$K T=$T σ=$sigma r=$r', ({ S, K, T, sigma, r }) => {
    const model: ProjectModel = {
      underlying: { value: S, volatility: sigma },
      riskFreeRate: r,
      horizon: T,
      steps: 2000,
      options: [{ kind: 'defer', cost: K, window: { kind: 'european', at: T } }],
    };
    const rows = valueProject(model).sensitivities!;
    const spot = rows.find((x) => x.parameter === 'underlying.value')!;
    const vol = rows.find((x) => x.parameter === 'underlying.volatility')!;
    const price = (s: number, v: number) => blackScholes(s, K, T, v, r, 'call');
    for (const side of ['low', 'high'] as const) {
      expectClose(spot[side].expandedNpv!, price(spot[side].input, sigma), { abs: 0.005 }, { row: 'V0', side });
      expectClose(vol[side].expandedNpv!, price(S, vol[side].input), { abs: 0.005 }, { row: 'σ', side });
    }
    const d1 = (Math.log(S / K) + (r + (sigma * sigma) / 2) * T) / (sigma * Math.sqrt(T));
    const delta = normalCdf(d1);
    const vega = S * normalPdf(d1) * Math.sqrt(T);
    const engineDelta = (spot.high.expandedNpv! - spot.low.expandedNpv!) / (spot.high.input - spot.low.input);
    const closedDelta = (price(spot.high.input, sigma) - price(spot.low.input, sigma)) / (spot.high.input - spot.low.input);
    const engineVega = (vol.high.expandedNpv! - vol.low.expandedNpv!) / (vol.high.input - vol.low.input);
    const closedVega = (price(S, vol.high.input) - price(S, vol.low.input)) / (vol.high.input - vol.low.input);
    // Lattice error on each end is ≤ 0.005, so on a difference over 2h it is ≤ 0.01/(2h).
    expectClose(engineDelta, delta, { abs: Math.abs(closedDelta - delta) + 0.01 / (spot.high.input - spot.low.input) }, { greek: 'delta' });
    expectClose(engineVega, vega, { abs: Math.abs(closedVega - vega) + 0.01 / (vol.high.input - vol.low.input) }, { greek: 'vega' });
  });
});
