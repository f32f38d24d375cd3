/**
 * An independent value of a model's rights by least-squares Monte Carlo (Longstaff & Schwartz
 * 2001, RFS 14(1)), written apart from lattice/ (docs/engine.md §11). Only the model's schema
 * is shared: the states and moves are read by ./modes.ts, the value paths are simulated here.
 *
 * - The project's value V follows a geometric Brownian motion with drift r less the model's
 *   payouts (a period's share paid evenly as a yield, a lump in the step that ends on its
 *   date), the same convention as the lattice (docs/engine.md §4). Decisions are taken on the
 *   lattice's own dates (every step of `steps`), so neither method has more exercise dates.
 * - Each state's value is split as the lattice's is: staying for good is worth scale·V plus the
 *   PV of its flows, known in closed form; only the rights still open are simulated. Using a
 *   right pays Δscale·V + ΔPV(flows) − cost on the path, which keeps the variance low.
 * - Backward pass: on the fitting paths, built from the horizon back by a Brownian bridge (so
 *   memory is one number per path and state, whatever the number of dates), each state's
 *   continuation is regressed on 1, y, y², y³, y⁴ and V/V̄ (y the standardised log-value, V̄ the
 *   date's mean), over all paths: stage payments and other moves that cost money before they
 *   earn can be worth taking where their immediate payoff is negative, so Longstaff and
 *   Schwartz's in-the-money filter does not apply. The mean of the pathwise values at the root
 *   is the in-sample estimate; its foresight biases it up (Longstaff & Schwartz 2001 §3).
 * - Forward pass: the fitted rule applied to an independent set of paths gives a value no
 *   policy can beat on average, so it is biased down; the rights' use probabilities come
 *   from it.
 * Paths come in antithetic pairs (a draw and its negative); standard errors are computed over
 * the pairs' means. Seeded: the same model, paths and seed give the same answer.
 */
import { openSteps } from '@/lattice';
import type { Cost, ProjectModel } from '@/lattice/schema';
import { normalDraws } from '../volatility/normal-draws';
import { readStates } from './modes';

export interface CrossCheckSpec {
  /** Paths in each of the two passes (even: they come in antithetic pairs). */
  paths: number;
  seed: number;
}

export interface Estimate {
  expandedNpv: number;
  standardError: number;
}

export interface MonteCarloResult {
  paths: number;
  seed: number;
  /** Decision dates (the lattice's steps + 1). */
  dates: number;
  /** The fitted rule on independent paths (biased down). */
  lowBiased: Estimate;
  /** The fitted rule on the paths it was fitted to (biased up). */
  highBiased: Estimate;
  /** How often each right is used at least once, on the independent paths. */
  rights: { id: string; probability: number; standardError: number }[];
}

const BASIS = 6;

function amountAt(cost: Cost, t: number): number {
  if (typeof cost === 'number') return cost;
  if (!Array.isArray(cost)) return cost.amount * Math.exp(cost.growth * t);
  // A step schedule: the last entry that has started, or the first before any has.
  const started = cost.filter((step) => step.from <= t);
  return (started.at(-1) ?? cost[0]!).amount;
}

/** The share of V kept over each step after the model's payouts (docs/engine.md §4). */
function keptPerStep(model: ProjectModel, dt: number): Float64Array {
  const steps = model.steps;
  const logKept = new Float64Array(steps).fill(-(model.underlying.payoutYield ?? 0) * dt);
  for (const period of model.underlying.payoutPeriods ?? []) {
    const length = period.to - period.from;
    if (length <= 0) continue;
    const rate = -Math.log(1 - period.fraction) / length;
    for (let k = 0; k < steps; k++) {
      const overlap = Math.min(period.to, (k + 1) * dt) - Math.max(period.from, k * dt);
      if (overlap > 0) logKept[k]! -= rate * overlap;
    }
  }
  for (const lump of model.underlying.payouts ?? []) {
    // The step that ends on (or runs through) the lump's date; a lump at 0 goes to the first.
    const k = Math.min(steps - 1, Math.max(0, Math.ceil(lump.at / dt - 1e-9) - 1));
    logKept[k]! += Math.log(1 - lump.fraction);
  }
  return logKept.map(Math.exp);
}

/** Solves A·x = b for a symmetric positive definite A (row-major n×n) by Cholesky; A is overwritten. */
function solveSymmetric(a: Float64Array, b: Float64Array, n: number): Float64Array {
  let trace = 0;
  for (let i = 0; i < n; i++) trace += a[i * n + i]!;
  // A ridge far below the data's scale keeps an almost collinear basis solvable.
  for (let i = 0; i < n; i++) a[i * n + i]! += 1e-12 * trace;
  for (let j = 0; j < n; j++) {
    let d = a[j * n + j]!;
    for (let k = 0; k < j; k++) d -= a[j * n + k]! ** 2;
    d = Math.sqrt(Math.max(d, 1e-300));
    a[j * n + j] = d;
    for (let i = j + 1; i < n; i++) {
      let s = a[i * n + j]!;
      for (let k = 0; k < j; k++) s -= a[i * n + k]! * a[j * n + k]!;
      a[i * n + j] = s / d;
    }
  }
  const x = Float64Array.from(b);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < i; k++) x[i]! -= a[i * n + k]! * x[k]!;
    x[i]! /= a[i * n + i]!;
  }
  for (let i = n - 1; i >= 0; i--) {
    for (let k = i + 1; k < n; k++) x[i]! -= a[k * n + i]! * x[k]!;
    x[i]! /= a[i * n + i]!;
  }
  return x;
}

/** The basis at one date: standardisation of log-values, and the mean value. */
interface Basis {
  meanLog: number;
  sdLog: number;
  meanValue: number;
}

function basisOf(values: Float64Array): Basis | null {
  let meanLog = 0;
  let meanValue = 0;
  for (const v of values) {
    meanLog += Math.log(v);
    meanValue += v;
  }
  meanLog /= values.length;
  meanValue /= values.length;
  let variance = 0;
  for (const v of values) variance += (Math.log(v) - meanLog) ** 2;
  const sdLog = Math.sqrt(variance / values.length);
  // Today every path has the same value: the regression is the mean.
  return sdLog > 1e-12 ? { meanLog, sdLog, meanValue } : null;
}

function fillBasis(row: Float64Array, v: number, basis: Basis) {
  const y = (Math.log(v) - basis.meanLog) / basis.sdLog;
  row[0] = 1;
  row[1] = y;
  row[2] = y * y;
  row[3] = y * y * y;
  row[4] = y * y * y * y;
  row[5] = v / basis.meanValue;
}

function meanAndError(pairs: Float64Array): { mean: number; standardError: number } {
  let mean = 0;
  for (const x of pairs) mean += x;
  mean /= pairs.length;
  let variance = 0;
  for (const x of pairs) variance += (x - mean) ** 2;
  return { mean, standardError: Math.sqrt(variance / (pairs.length - 1) / pairs.length) };
}

export function leastSquaresMonteCarlo(model: ProjectModel, spec: CrossCheckSpec, onProgress?: (fraction: number) => void): MonteCarloResult {
  const graph = readStates(model);
  const { states, moves } = graph;
  const N = model.steps;
  const T = model.horizon;
  const dt = T / N;
  const r = model.riskFreeRate;
  const sigma = model.underlying.volatility;
  const stepDiscount = Math.exp(-r * dt);
  const half = Math.floor(spec.paths / 2);
  const P = half * 2;
  if (half < 2) throw new Error('A cross-check needs at least 4 paths.');

  // Where V stands on each date apart from the noise: V_k = V0·kept_k·e^{(r − σ²/2)t_k + σW_k}.
  const kept = keptPerStep(model, dt);
  const level = new Float64Array(N + 1);
  level[0] = model.underlying.value;
  for (let k = 1; k <= N; k++) level[k] = level[k - 1]! * kept[k - 1]! * Math.exp((r - (sigma * sigma) / 2) * dt);

  // PV at each date of a state's own flows from that date on and its terminal value.
  const ownPv = states.map((s) => {
    const pv = new Float64Array(N + 1);
    pv[N] = s.terminal;
    for (let k = N - 1; k >= 0; k--) pv[k] = s.flowPerYear * dt + stepDiscount * pv[k + 1]!;
    return pv;
  });
  // A move pays slope·V + constant on date k.
  const moveData = moves.map((m) => {
    // The lattice's dates: the same model decides on the same dates in both methods.
    const open = openSteps(m.window, dt, N, 'window', []);
    const constant = new Float64Array(N + 1);
    for (let k = 0; k <= N; k++) constant[k] = ownPv[m.to]![k]! - ownPv[m.from]![k]! - amountAt(m.cost, k * dt);
    return { ...m, open, slope: states[m.to]!.scale - states[m.from]!.scale, constant };
  });
  const movesAt = Array.from({ length: N + 1 }, (_, k) => moveData.filter((m) => m.open[k]));

  // ---- Backward pass: fit the rule on paths built from the horizon back. ----
  const draw = normalDraws(spec.seed);
  const W = new Float64Array(P);
  for (let p = 0; p < half; p++) {
    const z = draw() * Math.sqrt(T);
    W[p] = z;
    W[p + half] = -z;
  }
  const V = new Float64Array(P);
  const realized = states.map(() => new Float64Array(P));
  // The fitted continuation of each state on each date: as a move's target, and as the state decided in.
  const fitted: { target?: Float64Array; source?: Float64Array }[][] = Array.from({ length: N + 1 }, () => states.map(() => ({})));
  const bases: (Basis | null)[] = new Array(N + 1).fill(null);
  const row = new Float64Array(BASIS);
  const design = new Float64Array(P * BASIS);
  const asTarget = states.map(() => new Float64Array(P));
  const asSource = states.map(() => new Float64Array(P));
  const totalWork = 2 * (N + 1);
  let lastReport = 0;
  const report = (done: number) => {
    if (onProgress && done / totalWork - lastReport >= 0.02) {
      lastReport = done / totalWork;
      onProgress(lastReport);
    }
  };

  for (let k = N; k >= 0; k--) {
    for (let p = 0; p < P; p++) V[p] = level[k]! * Math.exp(sigma * W[p]!);
    // Each state's value one date on, brought back to this date.
    if (k < N) for (const values of realized) for (let p = 0; p < P; p++) values[p]! *= stepDiscount;
    const open = movesAt[k]!;
    if (open.length > 0) {
      const basis = k === 0 ? null : basisOf(V);
      bases[k] = basis;
      let normal: Float64Array | null = null;
      if (basis && k < N) {
        normal = new Float64Array(BASIS * BASIS);
        for (let p = 0; p < P; p++) {
          fillBasis(row, V[p]!, basis);
          design.set(row, p * BASIS);
          for (let i = 0; i < BASIS; i++) for (let j = 0; j <= i; j++) normal[i * BASIS + j]! += row[i]! * row[j]!;
        }
        for (let i = 0; i < BASIS; i++) for (let j = 0; j < i; j++) normal[j * BASIS + i] = normal[i * BASIS + j]!;
      }
      const fit = (y: Float64Array, include: Uint8Array | null): Float64Array => {
        if (k === N) return new Float64Array(BASIS); // after the horizon nothing more is worth anything
        if (!normal) {
          let mean = 0;
          for (let p = 0; p < P; p++) mean += y[p]!;
          return Float64Array.of(mean / P, 0, 0, 0, 0, 0);
        }
        const xtx = include ? new Float64Array(BASIS * BASIS) : Float64Array.from(normal);
        const xty = new Float64Array(BASIS);
        for (let p = 0; p < P; p++) {
          if (include && !include[p]) continue;
          const at = p * BASIS;
          for (let i = 0; i < BASIS; i++) {
            xty[i]! += design[at + i]! * y[p]!;
            if (include) for (let j = 0; j <= i; j++) xtx[i * BASIS + j]! += design[at + i]! * design[at + j]!;
          }
        }
        if (include) for (let i = 0; i < BASIS; i++) for (let j = 0; j < i; j++) xtx[j * BASIS + i] = xtx[i * BASIS + j]!;
        return solveSymmetric(xtx, xty, BASIS);
      };
      const predict = (beta: Float64Array, out: Float64Array) => {
        if (!normal) return out.fill(beta[0]!);
        for (let p = 0; p < P; p++) {
          let c = 0;
          for (let i = 0; i < BASIS; i++) c += design[p * BASIS + i]! * beta[i]!;
          out[p] = c;
        }
        return out;
      };
      // A target's value continuing is needed wherever a move into it might be taken: all paths.
      for (const n of new Set(open.map((m) => m.to))) {
        const beta = fit(realized[n]!, null);
        fitted[k]![n]!.target = beta;
        predict(beta, asTarget[n]!);
      }
      // A source's value continuing only decides where some move is worth more than nothing
      // (the rights still open are never worth less than nothing): Longstaff and Schwartz's
      // in-the-money paths, generalised to moves whose target carries rights of its own.
      for (const s of new Set(open.map((m) => m.from))) {
        const live = new Uint8Array(P);
        let count = 0;
        const options = open.filter((m) => m.from === s);
        for (let p = 0; p < P; p++) {
          for (const m of options) {
            if (m.slope * V[p]! + m.constant[k]! + asTarget[m.to]![p]! > 0) {
              live[p] = 1;
              count++;
              break;
            }
          }
        }
        const beta = fit(realized[s]!, count >= 20 * BASIS ? live : null);
        fitted[k]![s]!.source = beta;
        predict(beta, asSource[s]!);
      }
      // Decide in every state with an open move, reading the targets' values before any is updated.
      const sources = [...new Set(open.map((m) => m.from))];
      const updated = sources.map((s) => {
        const next = new Float64Array(P);
        const own = realized[s]!;
        const stay = asSource[s]!;
        const options = open.filter((m) => m.from === s);
        for (let p = 0; p < P; p++) {
          // The rights still open are never worth less than nothing, whatever the fit says.
          let best = Math.max(stay[p]!, 0);
          let value = own[p]!;
          for (const m of options) {
            const pays = m.slope * V[p]! + m.constant[k]!;
            if (pays + asTarget[m.to]![p]! > best) {
              best = pays + asTarget[m.to]![p]!;
              value = pays + realized[m.to]![p]!;
            }
          }
          next[p] = value;
        }
        return next;
      });
      sources.forEach((s, n) => (realized[s] = updated[n]!));
    }
    // One date back along the bridge: W_{k−1} given W_k.
    if (k > 1) {
      const shrink = (k - 1) / k;
      const spread = Math.sqrt(dt * shrink);
      for (let p = 0; p < half; p++) {
        const z = draw() * spread;
        W[p] = W[p]! * shrink + z;
        W[p + half] = W[p + half]! * shrink - z;
      }
    } else if (k === 1) W.fill(0);
    report(N + 1 - k);
  }
  const startState = graph.start;
  const fixedToday = states[startState]!.scale * model.underlying.value + ownPv[startState]![0]! - graph.upfront;
  const inSample = new Float64Array(half);
  for (let p = 0; p < half; p++) inSample[p] = (realized[startState]![p]! + realized[startState]![p + half]!) / 2;

  // ---- Forward pass: the fitted rule on independent paths. ----
  const fresh = normalDraws(spec.seed + 1);
  const state = new Int32Array(P).fill(startState);
  const collected = new Float64Array(P);
  const used = new Int32Array(P);
  W.fill(0);
  // The fitted continuation at the basis `row` already filled for this path and date.
  const continuation = (k: number, s: number, role: 'target' | 'source') => {
    const beta = fitted[k]![s]![role];
    if (!beta) return 0;
    if (!bases[k]) return beta[0]!;
    let c = 0;
    for (let i = 0; i < BASIS; i++) c += row[i]! * beta[i]!;
    return c;
  };
  const openFrom = movesAt.map((open) => states.map((_, s) => open.filter((m) => m.from === s)));
  let discount = 1;
  for (let k = 0; k <= N; k++) {
    for (let p = 0; p < P; p++) {
      const options = openFrom[k]![state[p]!]!;
      if (options.length === 0) continue;
      const v = level[k]! * Math.exp(sigma * W[p]!);
      if (bases[k]) fillBasis(row, v, bases[k]!);
      let best = Math.max(continuation(k, state[p]!, 'source'), 0);
      let chosen = null;
      for (const m of options) {
        const pays = m.slope * v + m.constant[k]!;
        const total = pays + continuation(k, m.to, 'target');
        if (total > best) {
          best = total;
          chosen = m;
        }
      }
      if (chosen) {
        collected[p]! += discount * (chosen.slope * v + chosen.constant[k]!);
        state[p] = chosen.to;
        used[p]! |= 1 << chosen.right;
      }
    }
    if (k < N) {
      const step = Math.sqrt(dt);
      for (let p = 0; p < half; p++) {
        const z = fresh() * step;
        W[p]! += z;
        W[p + half]! -= z;
      }
    }
    discount *= stepDiscount;
    report(N + 1 + k + 1);
  }
  const outOfSample = new Float64Array(half);
  for (let p = 0; p < half; p++) outOfSample[p] = (collected[p]! + collected[p + half]!) / 2;

  const low = meanAndError(outOfSample);
  const high = meanAndError(inSample);
  const rights = graph.rights.map((id, n) => {
    const pairs = new Float64Array(half);
    for (let p = 0; p < half; p++) pairs[p] = (((used[p]! >> n) & 1) + ((used[p + half]! >> n) & 1)) / 2;
    const { mean, standardError } = meanAndError(pairs);
    return { id, probability: mean, standardError };
  });
  return {
    paths: P,
    seed: spec.seed,
    dates: N + 1,
    lowBiased: { expandedNpv: fixedToday + low.mean, standardError: low.standardError },
    highBiased: { expandedNpv: fixedToday + high.mean, standardError: high.standardError },
    rights,
  };
}
