/**
 * Volatility from history, checked against outside references:
 * - the χ² quantiles behind the interval (jStat) against NIST/SEMATECH e-Handbook of Statistical
 *   Methods, §1.3.6.7.4 "Critical values of the chi-square distribution" (ν = 10: 3.247 and
 *   20.483; ν = 30: 16.791 and 46.979), to the table's three decimals;
 * - the per-period standard deviation against simple-statistics' sampleStandardDeviation of the
 *   same log returns (a reference implementation), to 1e-12 relative;
 * - recovery of a known σ from a geometric Brownian motion simulated with a fixed seed: the
 *   estimate must lie within 3 standard errors, SE ≈ σ/√(2n) (the large-sample standard error of
 *   a sample standard deviation; common practice, no source), and the 95 % interval must hold σ.
 */
import { jStat } from 'jstat';
import { sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { estimateFromHistory, HistoryError, type HistoryPoint } from '@/lib/volatility/history';
import { normalDraws } from '@/lib/volatility/normal-draws';

const iso = (d: Date) => d.toISOString().slice(0, 10);

/** A GBM path with volatility σ a year sampled on the given dates (dt = 1/periodsPerYear). */
function gbm(dates: string[], sigma: number, periodsPerYear: number, seed: number): HistoryPoint[] {
  const z = normalDraws(seed);
  const dt = 1 / periodsPerYear;
  let value = 100;
  return dates.map((date, k) => {
    if (k > 0) value *= Math.exp(-0.5 * sigma * sigma * dt + sigma * Math.sqrt(dt) * z());
    return { date, value };
  });
}

function businessDays(start: string, count: number): string[] {
  const out: string[] = [];
  for (let d = new Date(`${start}T00:00:00Z`); out.length < count; d.setUTCDate(d.getUTCDate() + 1)) if (![0, 6].includes(d.getUTCDay())) out.push(iso(d));
  return out;
}

function monthEnds(startYear: number, count: number): string[] {
  return Array.from({ length: count }, (_, k) => iso(new Date(Date.UTC(startYear, k + 1, 0))));
}

describe('volatility from history', () => {
  it('uses χ² quantiles that match the NIST table', () => {
    const table: [number, number, number][] = [
      [10, 0.025, 3.247],
      [10, 0.975, 20.483],
      [30, 0.025, 16.791],
      [30, 0.975, 46.979],
    ];
    for (const [dof, p, printed] of table) expect({ dof, p, value: Number(jStat.chisquare.inv(p, dof).toFixed(3)) }).toEqual({ dof, p, value: printed });
  });

  it('computes the per-period standard deviation exactly as simple-statistics does', () => {
    const series = gbm(businessDays('2021-01-04', 300), 0.35, 252, 7);
    const estimate = estimateFromHistory(series);
    const reference = sampleStandardDeviation(series.slice(1).map((p, k) => Math.log(p.value / series[k]!.value)));
    expect(Math.abs(estimate.periodStdDev / reference - 1)).toBeLessThan(1e-12);
  });

  it('recovers σ = 30 % from four years of trading days, inside its 95 % interval', () => {
    const estimate = estimateFromHistory(gbm(businessDays('2021-01-04', 1009), 0.3, 252, 20261202));
    expect(estimate.frequency).toBe('daily (trading days)');
    expect(estimate.returns).toBe(1008);
    const se = 0.3 / Math.sqrt(2 * estimate.returns);
    expect(Math.abs(estimate.volatility - 0.3)).toBeLessThan(3 * se);
    expect(estimate.interval[0]).toBeLessThan(0.3);
    expect(estimate.interval[1]).toBeGreaterThan(0.3);
  });

  it('detects monthly data and annualises with 12 periods', () => {
    const estimate = estimateFromHistory(gbm(monthEnds(2015, 121), 0.25, 12, 99));
    expect(estimate.frequency).toBe('monthly');
    expect(estimate.volatility).toBeCloseTo(estimate.periodStdDev * Math.sqrt(12), 12);
    const se = 0.25 / Math.sqrt(2 * 120);
    expect(Math.abs(estimate.volatility - 0.25)).toBeLessThan(3 * se);
  });

  it('sorts dates, and warns of gaps', () => {
    const weekly = Array.from({ length: 40 }, (_, k) => iso(new Date(Date.UTC(2022, 0, 3 + 7 * (k < 20 ? k : k + 5)))));
    const series = gbm(weekly, 0.3, 52, 3).reverse();
    const estimate = estimateFromHistory(series);
    expect(estimate.frequency).toBe('weekly');
    expect(estimate.warnings[0]).toBe('The dates were not in order; they were sorted before computing returns.');
    expect(estimate.warnings[1]).toMatch(/^1 gap in the series: 2022-05-16 to 2022-06-27 \(42 days\)/);
  });

  it('refuses what it cannot use, naming the row', () => {
    const good = gbm(businessDays('2023-01-02', 20), 0.3, 252, 1);
    const refusal = (series: HistoryPoint[]) => {
      try {
        estimateFromHistory(series);
        return 'accepted';
      } catch (error) {
        return (error as HistoryError).message;
      }
    };
    expect(refusal(good.map((p, k) => (k === 4 ? { ...p, value: 0 } : p)))).toBe(`Row 5 (${good[4]!.date}): the value is 0; log returns need values above 0.`);
    expect(refusal(good.map((p, k) => (k === 6 ? { ...p, date: good[5]!.date } : p)))).toBe(`Rows 6 and 7 have the same date, ${good[5]!.date}.`);
    expect(refusal(good.slice(0, 8))).toBe('Give at least 11 dated values (10 returns); got 8.');
    const everyThirdDay = good.map((p, k) => ({ ...p, date: iso(new Date(Date.UTC(2023, 0, 1 + 3 * k))) }));
    expect(refusal(everyThirdDay)).toMatch(/^The dates are irregular: they are 3\.0 days apart at the median/);
    expect(refusal(good.map((p) => ({ ...p, value: 5 })))).toMatch(/never change/);
  });
});
