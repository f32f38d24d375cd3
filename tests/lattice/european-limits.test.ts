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
    const call: ProjectModel = { ...common, options: [{ type: 'defer', cost: K, window: { kind: 'european', at: T } }] };
    const put: ProjectModel = { ...common, options: [{ type: 'abandon', salvage: K, window: { kind: 'european', at: T } }] };
    expectClose(valueProject(call, { extras: false }).value, blackScholes(S, K, T, sigma, r, 'call'), { abs: 0.005 }, { S, K, T, sigma, r });
    expectClose(valueProject(put, { extras: false }).value - S, blackScholes(S, K, T, sigma, r, 'put'), { abs: 0.005 }, { S, K, T, sigma, r });
  });
});
