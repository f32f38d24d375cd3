/**
 * Published values beyond Hull (docs/engine.md §7).
 * - Longstaff & Schwartz (2001), *Review of Financial Studies* 14(1), Table 1 (all twenty rows,
 *   `tests/lattice/reference/longstaff-schwartz-2001-table1.csv`, a copy of the shared reference table): their finite-difference American put
 *   values. Their exercise is effectively discrete, so the engine uses a Bermudan window of 50
 *   dates a year on a 500-steps-a-year CRR tree. Tolerance 0.005: the table has three decimals
 *   and the finite-difference values carry their own grid error; the largest measured gap was
 *   0.0041 (S = 44, σ = 0.4, T = 2). Their closed-form European value is checked too (1000
 *   steps a year, tolerance 0.005, the CRR European error at that step count). The rows and
 *   their models are in reference/published-checks.ts, which the validation report reads too.
 * - Dixit & Pindyck (1994), *Investment under Uncertainty*, ch. 5: perpetual option to invest,
 *   r = δ = 0.04, σ = 0.2 gives β1 = 2, V* = 2I and F(V) = (V* − I)(V/V*)^β1. A 100-year defer
 *   window approximates the perpetuity: the value at V = I must be within 0.5 % of F(I) = I/4
 *   (the truncation of the horizon lowers it slightly), and the exercise boundary at year 10 must
 *   lie within one node spacing (a factor u²) of V*.
 * - Geske (1979), "The valuation of compound options", J. Financial Economics 7(1): a two-stage
 *   `stage` option is a call on a call; closed form with a bivariate normal (support/normal.ts).
 *   Tolerance 0.2 % relative at 1000 steps (binomial European error is O(1/N)).
 */
import { describe, it, expect } from 'vitest';
import { valueProject, type ProjectModel } from '@/lattice';
import { expectClose } from './support/check';
import { bivariateNormalCdf, normalCdf } from './support/normal';
import { longstaffSchwartzRows, publishedChecks } from './reference/published-checks';

const lsChecks = publishedChecks.filter((c) => c.source.startsWith('Longstaff'));

describe('Longstaff & Schwartz (2001) Table 1', () => {
  it('has all twenty rows, American and European', () => {
    expect(longstaffSchwartzRows).toHaveLength(20);
    expect(lsChecks).toHaveLength(40);
  });

  it.each(lsChecks)('$what ≈ $published', (check) => {
    const result = valueProject(check.model, { extras: false });
    expectClose(check.read(result), check.published, { abs: check.tolerance }, { source: check.source, what: check.what });
  });
});

describe('Dixit & Pindyck (1994) ch. 5, perpetual option to invest', () => {
  const r = 0.04;
  const delta = 0.04;
  const sigma = 0.2;
  const I = 100;
  const a = (r - delta) / (sigma * sigma) - 0.5;
  const beta1 = -a + Math.sqrt(a * a + (2 * r) / (sigma * sigma));
  const threshold = (beta1 / (beta1 - 1)) * I;

  it('has β1 = 2 and V* = 2I in the base case', () => {
    expectClose(beta1, 2, { abs: 1e-12 }, { r, delta, sigma });
    expectClose(threshold, 200, { abs: 1e-9 }, { r, delta, sigma });
  });

  it('a 100-year defer option approaches F(V) and its boundary approaches V*', () => {
    const model: ProjectModel = {
      underlying: { value: I, volatility: sigma, payoutYield: delta },
      riskFreeRate: r,
      horizon: 100,
      steps: 4000,
      options: [{ kind: 'defer', cost: I, window: { kind: 'american', from: 0, to: 100 } }],
    };
    const result = valueProject(model, { extras: false });
    const perpetual = (threshold - I) * (I / threshold) ** beta1;
    expectClose(result.value, perpetual, { rel: 0.005 }, { source: 'Dixit & Pindyck ch. 5', perpetual });
    expect(result.value).toBeLessThanOrEqual(perpetual);
    const atYear10 = result.rights[0]!.boundary.find((b) => Math.abs(b.t - 10) < 1e-9)!;
    const spacing = result.tree.u / result.tree.d;
    expect(atYear10.low).not.toBeNull();
    expect(atYear10.low!).toBeGreaterThanOrEqual(threshold / spacing);
    expect(atYear10.low!).toBeLessThanOrEqual(threshold * spacing);
  });
});

describe('Geske (1979) compound option', () => {
  function blackScholesCall(S: number, K: number, r: number, sigma: number, T: number) {
    const d1 = (Math.log(S / K) + (r + (sigma * sigma) / 2) * T) / (sigma * Math.sqrt(T));
    return S * normalCdf(d1) - K * Math.exp(-r * T) * normalCdf(d1 - sigma * Math.sqrt(T));
  }
  /** Call (strike I1 at t1) on a call (strike I2 at T2) on V, no payouts. */
  function geske(V: number, I1: number, t1: number, I2: number, T2: number, r: number, sigma: number) {
    // The critical value V* at t1 where the inner call is worth exactly I1 (bisection).
    let lo = 1e-9;
    let hi = 100 * (I1 + I2);
    for (let k = 0; k < 200; k++) {
      const mid = (lo + hi) / 2;
      if (blackScholesCall(mid, I2, r, sigma, T2 - t1) > I1) hi = mid;
      else lo = mid;
    }
    const critical = (lo + hi) / 2;
    const rho = Math.sqrt(t1 / T2);
    const a1 = (Math.log(V / critical) + (r + (sigma * sigma) / 2) * t1) / (sigma * Math.sqrt(t1));
    const a2 = a1 - sigma * Math.sqrt(t1);
    const b1 = (Math.log(V / I2) + (r + (sigma * sigma) / 2) * T2) / (sigma * Math.sqrt(T2));
    const b2 = b1 - sigma * Math.sqrt(T2);
    return V * bivariateNormalCdf(a1, b1, rho) - I2 * Math.exp(-r * T2) * bivariateNormalCdf(a2, b2, rho) - I1 * Math.exp(-r * t1) * normalCdf(a2);
  }

  it.each([
    [100, 10, 1, 90, 3, 0.05, 0.3],
    [100, 25, 2, 110, 4, 0.04, 0.45],
    [80, 5, 0.5, 100, 2, 0.06, 0.25],
  ])('a two-stage project V=%f, I1=%f at %f, I2=%f at %f equals the compound call', (V, I1, t1, I2, T2, r, sigma) => {
    const model: ProjectModel = {
      underlying: { value: V, volatility: sigma },
      riskFreeRate: r,
      horizon: T2,
      steps: 1000,
      options: [
        {
          kind: 'stage',
          payments: [
            { at: t1, amount: I1 },
            { at: T2, amount: I2 },
          ],
        },
      ],
    };
    const value = valueProject(model, { extras: false }).value;
    expectClose(value, geske(V, I1, t1, I2, T2, r, sigma), { rel: 0.002 }, { source: 'Geske 1979', V, I1, t1, I2, T2, r, sigma });
  });
});
