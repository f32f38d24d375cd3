/**
 * Project volatility by Monte Carlo from uncertain drivers of the cash-flow model (the
 * consolidated-uncertainty approach), two ways side by side:
 *
 * - Copeland & Antikarov (2001, "Real Options: A Practitioner's Guide", ch. 9): simulate whole
 *   paths of cash flows; z = ln((OCF_1 + PV_1)/PV_0), with PV_1 the value at year 1 of the
 *   simulated cash flows of years 2… on the same path; σ = standard deviation of z.
 * - Brandão, Dyer & Hahn (2005, Decision Analysis 2(2), "Using binomial decision trees to solve
 *   real-option valuation problems"): the same, but PV_1 is the value of the cash flows *expected*
 *   given what is known at year 1. Only the first year's uncertainty enters, so the estimate is
 *   not inflated by the uncertainty of later years, which the full-path method counts as if it
 *   were resolved in year 1 (they report that it overstates σ).
 *
 * The drivers: an uncertain line L of the schedule is L_t = base_t · (1 + g)^t · Z_t, where the
 * level Z_t = Z_{t−1} · F_t moves by independent annual factors F_t with mean 1 and the chosen
 * spread (normal, lognormal, triangular or uniform). So E[Z_t | Z_1] = Z_1 and the conditional
 * expectation of every later year is known in closed form. Drivers are correlated through a
 * Gaussian copula (the same year's normal draws are correlated by a Cholesky factor, then mapped
 * to each factor's distribution). Draws come from a seeded generator (normal-draws.ts): the same
 * seed gives the same result.
 */
import { deviation, extent, mean as d3Mean } from 'd3';
import { jStat } from 'jstat';
import { z } from 'zod';
import { cashFlowScheduleSchema, type CashFlowSchedule, type CashFlowYear } from '../cash-flows';
import { normalDraws } from './normal-draws';

export const uncertainLines = ['revenue', 'operatingCost', 'tax', 'workingCapital'] as const;
export type UncertainLine = (typeof uncertainLines)[number];
export const distributions = ['normal', 'lognormal', 'triangular', 'uniform'] as const;
export type Distribution = (typeof distributions)[number];

export const MAX_PATHS = 1_000_000;

export const simulationSpecSchema = z
  .object({
    drivers: z
      .array(
        z.object({
          line: z.enum(uncertainLines),
          distribution: z.enum(distributions),
          /** Standard deviation of the annual factor (0.2 = 20 % a year). */
          spread: z.number().gt(0, 'The spread must be above 0 %.').max(1, 'The spread must be at most 100 % a year.'),
          /** Extra expected growth a year on top of the schedule (0 keeps the schedule as the expectation). */
          growth: z.number().gt(-0.5).lt(1).default(0),
        }),
      )
      .min(1, 'Mark at least one line as uncertain.')
      .max(4),
    /** Correlations between drivers, by pair in order: (0,1), (0,2), …, (1,2), … */
    correlations: z.array(z.number().min(-1).max(1)).default([]),
    paths: z
      .number()
      .int()
      .min(1_000, 'Use at least 1,000 paths.')
      .max(MAX_PATHS, `At most ${MAX_PATHS.toLocaleString('en-GB')} paths.`),
    seed: z
      .number()
      .int()
      .min(0)
      .max(2 ** 31 - 1),
  })
  .superRefine((spec, ctx) => {
    const n = spec.drivers.length;
    if (spec.correlations.length !== (n * (n - 1)) / 2)
      ctx.addIssue({ code: 'custom', path: ['correlations'], message: `Give ${(n * (n - 1)) / 2} correlations for ${n} drivers.` });
    const lines = spec.drivers.map((d) => d.line);
    if (new Set(lines).size !== lines.length) ctx.addIssue({ code: 'custom', path: ['drivers'], message: 'Each line can be uncertain once.' });
  });

export type SimulationSpec = z.input<typeof simulationSpecSchema>;

export interface MethodEstimate {
  volatility: number;
  mean: number;
  /**
   * Paths whose year-1 value (OCF_1 + PV_1) was zero or negative: a log return does not exist
   * for them, so they are left out of σ and reported (many of them strain the lognormal model).
   */
  excluded: number;
  /** Histogram of z = ln((OCF_1 + PV_1)/PV_0). */
  histogram: { from: number; to: number; count: number }[];
}

export interface SimulationResult {
  paths: number;
  seed: number;
  pv0: number;
  fullPath: MethodEstimate;
  conditional: MethodEstimate;
}

/** Lower-triangular L with L·Lᵀ = the correlation matrix; refuses a matrix that is not positive definite. */
export function cholesky(n: number, correlations: number[]): number[][] {
  const c = (i: number, j: number) => {
    if (i === j) return 1;
    const [a, b] = i < j ? [i, j] : [j, i];
    // Pairs in order (0,1), (0,2), …, (0,n−1), (1,2), …
    return correlations[a * n - (a * (a + 1)) / 2 + (b - a - 1)]!;
  };
  const L = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i++)
    for (let j = 0; j <= i; j++) {
      let sum = c(i, j);
      for (let k = 0; k < j; k++) sum -= L[i]![k]! * L[j]![k]!;
      if (i === j) {
        if (sum <= 1e-12) throw new Error('These correlations are not possible together (the matrix is not positive definite); bring them closer to 0.');
        L[i]![i] = Math.sqrt(sum);
      } else L[i]![j] = sum / L[j]![j]!;
    }
  return L;
}

/** Maps a standard normal draw to an annual factor with mean 1 and standard deviation s. */
export function factorFrom(distribution: Distribution, s: number): (z: number) => number {
  switch (distribution) {
    case 'normal':
      // Floored just above 0: a level cannot turn negative (a 5σ event at s = 20 %).
      return (z) => Math.max(1e-6, 1 + s * z);
    case 'lognormal': {
      const sigma = Math.sqrt(Math.log(1 + s * s));
      return (z) => Math.exp(-0.5 * sigma * sigma + sigma * z);
    }
    case 'uniform': {
      const half = s * Math.sqrt(3);
      return (z) => 1 - half + 2 * half * jStat.normal.cdf(z, 0, 1);
    }
    case 'triangular': {
      // Symmetric on [1 − c, 1 + c] with standard deviation c/√6.
      const c = s * Math.sqrt(6);
      return (z) => {
        const u = jStat.normal.cdf(z, 0, 1);
        return u < 0.5 ? 1 - c + c * Math.sqrt(2 * u) : 1 + c - c * Math.sqrt(2 * (1 - u));
      };
    }
  }
}

function summarise(all: Float64Array): MethodEstimate {
  const values = all.filter((v) => Number.isFinite(v));
  const excluded = all.length - values.length;
  const n = values.length;
  if (n < 2) return { volatility: NaN, mean: NaN, excluded, histogram: [] };
  // d3's mean and deviation (the sample standard deviation, n − 1, by Welford's method).
  const mean = d3Mean(values)!;
  const [lo, hi] = extent(values) as [number, number];
  const bins = 40;
  const width = (hi - lo) / bins || 1;
  const counts = new Array<number>(bins).fill(0);
  for (let k = 0; k < n; k++) counts[Math.min(bins - 1, Math.floor((values[k]! - lo) / width))]! += 1;
  return {
    volatility: deviation(values)!,
    mean,
    excluded,
    histogram: counts.map((count, b) => ({ from: lo + b * width, to: lo + (b + 1) * width, count })),
  };
}

/**
 * Runs the simulation. `onProgress(fraction)` is called about every 2 % of the paths, so a worker
 * can report it; the loop allocates nothing per path beyond a few small typed arrays.
 */
export function simulateVolatility(schedule: CashFlowSchedule, specInput: SimulationSpec, onProgress?: (fraction: number) => void): SimulationResult {
  const { rows, wacc, timing } = cashFlowScheduleSchema.parse(schedule);
  const spec = simulationSpecSchema.parse(specInput);
  if (rows.length < 3 || rows[0]!.year !== 0) throw new Error('The schedule needs year 0 and at least two more years to value the project at year 1.');
  const T = rows.length - 1; // years 1..T
  // Discount factors seen from year 0 and from year 1 (same conventions as lib/cash-flows.ts).
  const df0 = (t: number) => Math.pow(1 + wacc, -(timing === 'mid-year' && t >= 1 ? t - 0.5 : t));
  const df1 = (t: number) => df0(t) / df0(1);
  const driverOf = new Map(spec.drivers.map((d, k) => [d.line, k]));
  const growthFactor = (line: UncertainLine, t: number) => {
    const k = driverOf.get(line);
    return k === undefined ? 1 : Math.pow(1 + spec.drivers[k]!.growth, t);
  };
  // Operating cash flow of year t given the driver levels (undefined level = 1).
  const sign: Record<UncertainLine, number> = { revenue: 1, operatingCost: -1, tax: -1, workingCapital: -1 };
  const base = (r: CashFlowYear, line: UncertainLine) => r[line];
  const certainPart = rows.map((r) => uncertainLines.filter((l) => !driverOf.has(l)).reduce((s, l) => s + sign[l] * base(r, l), 0));
  // Expected operating cash flow of year t (all levels at their mean of 1).
  const expected = rows.map(
    (r, t) => certainPart[t]! + uncertainLines.filter((l) => driverOf.has(l)).reduce((s, l) => s + sign[l] * base(r, l) * growthFactor(l, t), 0),
  );
  let pv0 = 0;
  for (let t = 1; t <= T; t++) pv0 += expected[t]! * df0(t);
  if (!(pv0 > 0)) throw new Error('The operating cash flows of years 1 on are worth nothing or less, so there is no return to measure.');

  const n = spec.drivers.length;
  const L = cholesky(n, spec.correlations);
  const factors = spec.drivers.map((d) => factorFrom(d.distribution, d.spread));
  // Per driver: Σ_{t≥2} sign·base_t·g^t·df1(t), the conditional PV at year 1 per unit of level Z_1.
  const conditionalWeight = spec.drivers.map((d) => {
    let w = 0;
    for (let t = 2; t <= T; t++) w += sign[d.line] * base(rows[t]!, d.line) * growthFactor(d.line, t) * df1(t);
    return w;
  });
  let certainPv1 = 0;
  for (let t = 2; t <= T; t++) certainPv1 += certainPart[t]! * df1(t);

  const draw = normalDraws(spec.seed);
  const independent = new Float64Array(n);
  const level = new Float64Array(n);
  const fullPath = new Float64Array(spec.paths);
  const conditional = new Float64Array(spec.paths);
  const tick = Math.max(1, Math.floor(spec.paths / 50));
  const lineLevels = uncertainLines.map((l) => driverOf.get(l) ?? -1);

  for (let p = 0; p < spec.paths; p++) {
    level.fill(1);
    let ocf1 = 0;
    let pathPv1 = 0;
    for (let t = 1; t <= T; t++) {
      for (let k = 0; k < n; k++) independent[k] = draw();
      for (let k = 0; k < n; k++) {
        let zk = 0;
        for (let j = 0; j <= k; j++) zk += L[k]![j]! * independent[j]!;
        level[k]! *= factors[k]!(zk);
      }
      let ocf = certainPart[t]!;
      for (let li = 0; li < 4; li++) {
        const k = lineLevels[li]!;
        if (k >= 0) {
          const line = uncertainLines[li]!;
          ocf += sign[line] * base(rows[t]!, line) * growthFactor(line, t) * level[k]!;
        }
      }
      if (t === 1) {
        ocf1 = ocf;
        let pv1 = certainPv1;
        for (let k = 0; k < n; k++) pv1 += conditionalWeight[k]! * level[k]!;
        // A year-1 value at or below zero has no log return: marked NaN, left out and counted.
        conditional[p] = ocf1 + pv1 > 0 ? Math.log((ocf1 + pv1) / pv0) : NaN;
      } else pathPv1 += ocf * df1(t);
    }
    fullPath[p] = ocf1 + pathPv1 > 0 ? Math.log((ocf1 + pathPv1) / pv0) : NaN;
    if (onProgress && (p + 1) % tick === 0) onProgress((p + 1) / spec.paths);
  }
  return { paths: spec.paths, seed: spec.seed, pv0, fullPath: summarise(fullPath), conditional: summarise(conditional) };
}
