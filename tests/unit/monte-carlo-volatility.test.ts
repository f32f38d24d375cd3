/**
 * Monte Carlo volatility on a cash-flow model whose true project volatility is known: a single
 * revenue driver moving as a geometric Brownian motion (lognormal annual factors with mean 1),
 * nothing else uncertain. Then (OCF_1 + E_1[PV_1]) is proportional to the year-1 level, so the
 * conditional method of Brandão, Dyer & Hahn (2005) must recover the driver's log-volatility
 * σ = √ln(1 + s²) up to sampling error (tolerance: 4 standard errors of a sample standard
 * deviation, σ/√(2N); common practice, no source), while the full-path method of Copeland &
 * Antikarov (2001) overstates it, as Brandão, Dyer & Hahn report.
 */
import { describe, expect, it } from 'vitest';
import type { CashFlowSchedule } from '@/lib/cash-flows';
import { cholesky, factorFrom, simulateVolatility } from '@/lib/volatility/monte-carlo';
import { normalDraws } from '@/lib/volatility/normal-draws';

const flat: CashFlowSchedule = {
  wacc: 0.1,
  rows: Array.from({ length: 11 }, (_, year) => ({
    year,
    revenue: year === 0 ? 0 : 100,
    operatingCost: 0,
    tax: 0,
    workingCapital: 0,
    capex: year === 0 ? 500 : 0,
  })),
};

describe('Monte Carlo volatility', () => {
  it('recovers a GBM driver’s volatility by the conditional method, and the full-path method overstates it', () => {
    const s = 0.25;
    const truth = Math.sqrt(Math.log(1 + s * s));
    const paths = 40_000;
    const result = simulateVolatility(flat, { drivers: [{ line: 'revenue', distribution: 'lognormal', spread: s }], paths, seed: 11 });
    const se = truth / Math.sqrt(2 * paths);
    expect(Math.abs(result.conditional.volatility - truth)).toBeLessThan(4 * se);
    expect(result.fullPath.volatility).toBeGreaterThan(1.5 * result.conditional.volatility);
  });

  it('leaves out, and counts, paths whose year-1 value is not positive', () => {
    const thin: CashFlowSchedule = { ...flat, rows: flat.rows.map((r) => (r.year ? { ...r, operatingCost: 90 } : r)) };
    const result = simulateVolatility(thin, { drivers: [{ line: 'revenue', distribution: 'normal', spread: 0.3 }], paths: 5_000, seed: 9 });
    expect(result.fullPath.excluded).toBeGreaterThan(0);
    expect(Number.isFinite(result.fullPath.volatility)).toBe(true);
    expect(result.fullPath.histogram.reduce((n, b) => n + b.count, 0)).toBe(5_000 - result.fullPath.excluded);
  });

  it('gives the same numbers for the same seed, and reports progress to the end', () => {
    const spec = { drivers: [{ line: 'revenue' as const, distribution: 'triangular' as const, spread: 0.15 }], paths: 2_000, seed: 5 };
    const seen: number[] = [];
    const a = simulateVolatility(flat, spec, (f) => seen.push(f));
    const b = simulateVolatility(flat, spec);
    expect(a).toEqual(b);
    expect(seen.at(-1)).toBe(1);
    expect(a.conditional.histogram.reduce((n, bin) => n + bin.count, 0)).toBe(2_000);
  });

  it('maps normal draws to factors with mean 1 and the chosen spread for every distribution', () => {
    for (const distribution of ['normal', 'lognormal', 'triangular', 'uniform'] as const) {
      const f = factorFrom(distribution, 0.2);
      const z = normalDraws(3);
      const n = 200_000;
      let sum = 0;
      let sq = 0;
      for (let k = 0; k < n; k++) {
        const x = f(z());
        sum += x;
        sq += x * x;
      }
      const mean = sum / n;
      const sd = Math.sqrt(sq / n - mean * mean);
      // Sampling error of the mean: 0.2/√n ≈ 4.5e-4; of the sd about 0.2/√(2n) ≈ 3.2e-4 (times a kurtosis factor): 4e-3 is ample and still fails a wrong scale.
      expect({ distribution, mean: Math.abs(mean - 1) < 3e-3, sd: Math.abs(sd - 0.2) < 4e-3 }).toEqual({ distribution, mean: true, sd: true });
    }
  });

  it('correlates drivers through a valid Cholesky factor and refuses impossible correlations', () => {
    const L = cholesky(3, [0.5, 0.2, 0.3]);
    const product = (i: number, j: number) => L[i]!.reduce((s, v, k) => s + v * L[j]![k]!, 0);
    expect(product(0, 1)).toBeCloseTo(0.5, 12);
    expect(product(0, 2)).toBeCloseTo(0.2, 12);
    expect(product(1, 2)).toBeCloseTo(0.3, 12);
    expect(() => cholesky(3, [0.9, 0.9, -0.9])).toThrow('not positive definite');
  });
});
