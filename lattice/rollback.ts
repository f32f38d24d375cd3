/**
 * The backward induction (ENGINE.md §4), written once. Time runs backwards from the horizon;
 * at every node and for every mode the order is:
 *   1. continuation: the discounted risk-neutral expectation of the mode's value one step on
 *      (at the horizon there is no step on, so the continuation is the mode's own value);
 *   2. exercise: the best of continuing and of each switch open from the mode at this step,
 *      each switch worth the *continuation* of the mode it leads to minus its cost (so at most
 *      one switch per mode per node, and a switch never chains into another at the same node);
 *      a switch wins only if strictly better, so ties continue;
 *   3. record the decision and, for boundaries, the project value where each switch is taken.
 * Values are rolled back as O = W − A (see plan.ts), so step 1 is a plain discounted average of
 * O and step 2 adds the closed-form difference A_to − A_from = Δscale·V + offset.
 *
 * The hot loop allocates nothing, calls no closure per node and never calls Math.pow: V at node
 * (i, j + 1) is V at (i, j) times u/d.
 */
import type { LatticePlan } from './plan';

export interface RollbackOptions {
  /** Keep one byte per node per mode with the decision taken (needed for probabilities). */
  decisions: boolean;
  /** Track, per switch and step, the lowest and highest project value where it is taken. */
  boundaries: boolean;
  /** Copy the values of every mode for steps 0..gridSteps (the node grid on request). */
  gridSteps: number;
  /** Copy the continuation and values at this step and the values one step on (explainNode). */
  captureStep: number;
}

export interface RollbackResult {
  /** O at the root for every mode. */
  rootOption: Float64Array;
  /** Per mode, decision bytes indexed by i(i+1)/2 + j: 0 = continue, k = byMode[m][k − 1]. */
  decisions: Uint8Array[] | null;
  /** [switch·(N+1) + i] lowest / highest V where the switch is taken (NaN when never). */
  boundaryLow: Float64Array | null;
  boundaryHigh: Float64Array | null;
  /** grid[i][m] = O values at step i (length i + 1), for i ≤ gridSteps. */
  grid: Float64Array[][] | null;
  capture: { continuation: Float64Array[]; value: Float64Array[]; next: Float64Array[] | null } | null;
}

/** Option values below this (in money) are zero for every purpose and are flushed to 0. */
const TINY = 1e-200;

const none: RollbackOptions = { decisions: false, boundaries: false, gridSteps: -1, captureStep: -1 };

export function rollback(plan: LatticePlan, options: Partial<RollbackOptions> = {}): RollbackResult {
  const opts = { ...none, ...options };
  const { steps, p, discount, lowest, modeCount, deltaScale, offset, open, byMode, to } = plan;
  const width = steps + 1;
  const ratio = plan.u / plan.d;
  const pu = discount * p;
  const pd = discount * (1 - p);

  const value: Float64Array[] = [];
  const cont: Float64Array[] = [];
  for (let m = 0; m < modeCount; m++) {
    value.push(new Float64Array(width));
    cont.push(new Float64Array(width));
  }
  const decisions = opts.decisions
    ? byMode.map((list) => (list.length > 0 ? new Uint8Array((width * (width + 1)) / 2) : new Uint8Array(0)))
    : null;
  const boundaryLow = opts.boundaries ? new Float64Array(plan.switchCount * width).fill(NaN) : null;
  const boundaryHigh = opts.boundaries ? new Float64Array(plan.switchCount * width).fill(NaN) : null;
  const grid: Float64Array[][] | null = opts.gridSteps >= 0 ? [] : null;
  let capture: RollbackResult['capture'] = null;
  const openList = new Int32Array(plan.switchCount);
  const swapped = new Int32Array(modeCount);

  // A mode with no switch out of it is worth its closed form for good: O ≡ 0, nothing to roll.
  const rolled: number[] = [];
  for (let m = 0; m < modeCount; m++) if (byMode[m]!.length > 0) rolled.push(m);
  const targetIsFixed = Uint8Array.from(to, (m) => (byMode[m]!.length === 0 ? 1 : 0));
  // A rolled mode that no switch leads into, and whose switches all lead to fixed modes, can be
  // rolled in place in one fused loop: nobody else reads its continuation.
  const isTarget = new Uint8Array(modeCount);
  for (let s = 0; s < plan.switchCount; s++) isTarget[to[s]!] = 1;
  const fused = rolled.filter((m) => isTarget[m] === 0 && byMode[m]!.every((s) => targetIsFixed[s] === 1));
  const separate = rolled.filter((m) => !fused.includes(m));
  const fuseAllowed = opts.gridSteps < 0 && opts.captureStep < 0;

  /** Steps 1–3 for one fused mode at step i < N, in place (j ascending reads w[j + 1] unchanged). */
  function fusedStep(m: number, i: number) {
    const w = value[m]!;
    const list = byMode[m]!;
    let n = 0;
    for (let k = 0; k < list.length; k++) if (open[list[k]! * width + i] === 1) openList[n++] = k;
    if (n === 0) {
      for (let j = 0; j <= i; j++) {
        const x = pu * w[j + 1]! + pd * w[j]!;
        w[j] = x > TINY || x < -TINY ? x : 0;
      }
      return;
    }
    const map = decisions ? decisions[m]! : null;
    const base = (i * (i + 1)) / 2;
    let v = lowest[i]!;
    if (n === 1 && !map && !boundaryLow) {
      // Locals, not captured variables, so the loop keeps everything in registers.
      const s = list[openList[0]!]!;
      const ds = deltaScale[s]!;
      const off = offset[s * width + i]!;
      const up = pu;
      const down = pd;
      const step = ratio;
      for (let j = 0; j <= i; j++) {
        const hold = up * w[j + 1]! + down * w[j]!;
        const x = ds * v + off;
        w[j] = x > hold ? x : hold;
        v *= step;
      }
      return;
    }
    for (let j = 0; j <= i; j++) {
      const hold = pu * w[j + 1]! + pd * w[j]!;
      let best = hold > TINY || hold < -TINY ? hold : 0;
      let choice = 0;
      for (let q = 0; q < n; q++) {
        const k = openList[q]!;
        const s = list[k]!;
        const x = deltaScale[s]! * v + offset[s * width + i]!;
        if (x > best) {
          best = x;
          choice = k + 1;
        }
      }
      w[j] = best;
      if (map) map[base + j] = choice;
      if (choice !== 0 && boundaryLow && boundaryHigh) {
        const cell = list[choice - 1]! * width + i;
        if (!(v >= boundaryLow[cell]!)) boundaryLow[cell] = v;
        if (!(v <= boundaryHigh[cell]!)) boundaryHigh[cell] = v;
      }
      v *= ratio;
    }
  }

  for (let i = steps; i >= 0; i--) {
    if (i === opts.captureStep) {
      // Before step i is rolled back, `value` still holds step i + 1.
      capture = { continuation: [], value: [], next: i < steps ? value.map((row) => row.slice(0, i + 2)) : null };
    }
    if (fuseAllowed && i < steps) for (const m of fused) fusedStep(m, i);
    const pending = fuseAllowed ? separate : rolled;
    // 1. continuation
    for (const m of i === steps ? rolled : pending) {
      const c = cont[m]!;
      if (i === steps) {
        c.fill(0);
        continue;
      }
      const w = value[m]!;
      for (let j = 0; j <= i; j++) {
        const x = pu * w[j + 1]! + pd * w[j]!;
        // Flush values far below any money amount to zero: left alone they decay into subnormal
        // numbers deep out of the money, which the processor handles many times slower.
        c[j] = x > TINY || x < -TINY ? x : 0;
      }
    }
    // 2. exercise, for modes with a switch open at this step; 3. decisions and boundaries.
    let swappedCount = 0;
    for (const m of i === steps || !fuseAllowed ? rolled : separate) {
      const list = byMode[m]!;
      let n = 0;
      for (let k = 0; k < list.length; k++) if (open[list[k]! * width + i] === 1) openList[n++] = k;
      if (n === 0) {
        swapped[swappedCount++] = m;
        continue;
      }
      const c = cont[m]!;
      const w = value[m]!;
      const map = decisions ? decisions[m]! : null;
      const base = (i * (i + 1)) / 2;
      const v0 = lowest[i]!;
      if (n === 1 && targetIsFixed[list[openList[0]!]!] === 1 && !map && !boundaryLow) {
        // The common case (one right into a mode worth its closed form), kept branch-light.
        const s = list[openList[0]!]!;
        const ds = deltaScale[s]!;
        const off = offset[s * width + i]!;
        let v = v0;
        for (let j = 0; j <= i; j++) {
          const x = ds * v + off;
          const hold = c[j]!;
          w[j] = x > hold ? x : hold;
          v *= ratio;
        }
        continue;
      }
      let v = v0;
      for (let j = 0; j <= i; j++) {
        let best = c[j]!;
        let choice = 0;
        for (let q = 0; q < n; q++) {
          const k = openList[q]!;
          const s = list[k]!;
          const x = deltaScale[s]! * v + offset[s * width + i]! + cont[to[s]!]![j]!;
          if (x > best) {
            best = x;
            choice = k + 1;
          }
        }
        w[j] = best;
        if (map) map[base + j] = choice;
        if (choice !== 0 && boundaryLow && boundaryHigh) {
          const cell = list[choice - 1]! * width + i;
          if (!(v >= boundaryLow[cell]!)) boundaryLow[cell] = v;
          if (!(v <= boundaryHigh[cell]!)) boundaryHigh[cell] = v;
        }
        v *= ratio;
      }
    }
    // Modes with nothing open keep their continuation: swap buffers (after every mode above
    // has read the continuations it needs).
    for (let k = 0; k < swappedCount; k++) {
      const m = swapped[k]!;
      const t = value[m]!;
      value[m] = cont[m]!;
      cont[m] = t;
    }
    if (grid && i <= opts.gridSteps) grid[i] = value.map((row) => row.slice(0, i + 1));
    if (capture && i === opts.captureStep) {
      // For swapped modes the continuation now sits in value; it equals the value there.
      const kept = Array.from(swapped.subarray(0, swappedCount));
      capture.continuation = value.map((row, m) => (kept.includes(m) ? row.slice(0, i + 1) : cont[m]!.slice(0, i + 1)));
      capture.value = value.map((row) => row.slice(0, i + 1));
    }
  }

  return {
    rootOption: Float64Array.from(value, (row) => row[0]!),
    decisions,
    boundaryLow,
    boundaryHigh,
    grid,
    capture,
  };
}
