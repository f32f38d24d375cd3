/**
 * The backward induction (ENGINE.md §4), written once. Time runs backwards from the horizon;
 * at every node and for every mode the order is:
 *   1. continuation: the discounted risk-neutral expectation of the mode's value one step on
 *      (at the horizon there is no step on, so the continuation is the mode's own value);
 *   2. exercise: the best of continuing and of each switch open from the mode at this step,
 *      each switch worth the *continuation* of the mode it leads to minus its cost (so at most
 *      one switch per mode per node, and a switch never chains into another at the same node);
 *      a switch wins only if strictly better, so ties continue;
 *   3. record the decision (run-length encoded, see decision-runs.ts).
 * Values are rolled back as O = W − A (see plan.ts), so step 1 is a plain discounted average of
 * O and step 2 adds the closed-form difference A_to − A_from = Δscale·V + offset. A mode with no
 * switch out of it has O ≡ 0 and is not rolled at all.
 *
 * The hot loops allocate nothing, call no closure per node and never call Math.pow: V at node
 * (i, j + 1) is V at (i, j) times u/d. Values the loops read are copied into locals first so
 * the JIT keeps them in registers.
 */
import { DecisionRuns } from './decision-runs';
import type { LatticePlan } from './plan';

export interface RollbackOptions {
  /** Record the decision map and the exercise boundaries (needed for probabilities). */
  decisions: boolean;
  /** Copy the values of every mode for steps 0..gridSteps (the node grid on request). */
  gridSteps: number;
  /** Copy the continuation and values at this step and the values one step on (explainNode). */
  captureStep: number;
}

export interface RollbackResult {
  /** O at the root for every mode. */
  rootOption: Float64Array;
  decisions: DecisionRuns | null;
  /** [switch·(N+1) + i] lowest / highest V where the switch is taken (NaN when never). */
  boundaryLow: Float64Array | null;
  boundaryHigh: Float64Array | null;
  /** grid[i][m] = O values at step i (length i + 1), for i ≤ gridSteps. */
  grid: Float64Array[][] | null;
  capture: { continuation: Float64Array[]; value: Float64Array[]; next: Float64Array[] | null } | null;
}

const none: RollbackOptions = { decisions: false, gridSteps: -1, captureStep: -1 };

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
    const rolledMode = byMode[m]!.length > 0;
    value.push(new Float64Array(rolledMode ? width : 0));
    cont.push(new Float64Array(rolledMode ? width : 0));
  }
  // A mode with no switch out of it is worth its closed form for good: O ≡ 0, nothing to roll.
  const fixedValue = new Float64Array(width);
  for (let m = 0; m < modeCount; m++) if (byMode[m]!.length === 0) value[m] = cont[m] = fixedValue;
  const rolled: number[] = [];
  for (let m = 0; m < modeCount; m++) if (byMode[m]!.length > 0) rolled.push(m);
  // A rolled mode that no switch leads into, and whose switches all lead to fixed modes, is
  // rolled in place in one fused loop: nobody else reads its continuation.
  const isTarget = new Uint8Array(modeCount);
  for (let s = 0; s < plan.switchCount; s++) isTarget[to[s]!] = 1;
  const fused = new Uint8Array(modeCount);
  const snapshots = opts.gridSteps >= 0 || opts.captureStep >= 0;
  for (const m of rolled) if (!snapshots && isTarget[m] === 0 && byMode[m]!.every((s) => byMode[to[s]!]!.length === 0)) fused[m] = 1;

  const decisions = opts.decisions ? new DecisionRuns(modeCount, width) : null;
  const boundaryLow = opts.decisions ? new Float64Array(plan.switchCount * width).fill(NaN) : null;
  const boundaryHigh = opts.decisions ? new Float64Array(plan.switchCount * width).fill(NaN) : null;
  const grid: Float64Array[][] | null = opts.gridSteps >= 0 ? [] : null;
  let capture: RollbackResult['capture'] = null;
  const openList = new Int32Array(plan.switchCount);
  const swapped = new Int32Array(modeCount);

  /** Boundaries of one finished row, read from its runs (a few per row, so Math.pow is fine). */
  function recordBoundaries(m: number, i: number) {
    if (!decisions || !boundaryLow || !boundaryHigh) return;
    const row = m * width + i;
    const first = decisions.rowFirst[row]!;
    const count = decisions.rowCount[row]!;
    const list = byMode[m]!;
    for (let k = first; k < first + count; k++) {
      const choice = decisions.choices[k]!;
      if (choice === 0) continue;
      const startJ = decisions.starts[k]!;
      const endJ = k + 1 < first + count ? decisions.starts[k + 1]! - 1 : i;
      const cell = list[choice - 1]! * width + i;
      const low = lowest[i]! * Math.pow(ratio, startJ);
      const high = lowest[i]! * Math.pow(ratio, endJ);
      if (!(low >= boundaryLow[cell]!)) boundaryLow[cell] = low;
      if (!(high <= boundaryHigh[cell]!)) boundaryHigh[cell] = high;
    }
  }

  /** Collects the open switches of mode m at step i into openList; returns how many. */
  function openAt(m: number, i: number): number {
    const list = byMode[m]!;
    let n = 0;
    for (let k = 0; k < list.length; k++) if (open[list[k]! * width + i] === 1) openList[n++] = k;
    return n;
  }

  /** Steps 1–3 for a fused mode with one open switch, in place (j ascending reads w[j+1] unchanged). */
  function fusedSingle(m: number, i: number, k: number) {
    const w = value[m]!;
    const s = byMode[m]![k]!;
    const ds = deltaScale[s]!;
    const off = offset[s * width + i]!;
    const up = pu;
    const down = pd;
    const step = ratio;
    const last = i === steps;
    let v = lowest[i]!;
    if (!decisions) {
      for (let j = 0; j <= i; j++) {
        const hold = last ? 0 : up * w[j + 1]! + down * w[j]!;
        const x = ds * v + off;
        w[j] = x > hold ? x : hold;
        v *= step;
      }
      return;
    }
    const row = m * width + i;
    decisions.rowFirst[row] = decisions.length;
    let previous = -1;
    for (let j = 0; j <= i; j++) {
      const hold = last ? 0 : up * w[j + 1]! + down * w[j]!;
      const x = ds * v + off;
      const choice = x > hold ? k + 1 : 0;
      w[j] = x > hold ? x : hold;
      if (choice !== previous) {
        decisions.push(j, choice);
        previous = choice;
      }
      v *= step;
    }
    decisions.rowCount[row] = decisions.length - decisions.rowFirst[row]!;
    recordBoundaries(m, i);
  }

  for (let i = steps; i >= 0; i--) {
    if (i === opts.captureStep) {
      // Before step i is rolled back, `value` still holds step i + 1.
      capture = { continuation: [], value: [], next: i < steps ? value.map((row) => row.slice(0, i + 2)) : null };
    }
    // Fused modes do all three steps in one loop.
    for (const m of rolled) {
      if (fused[m] !== 1) continue;
      const n = openAt(m, i);
      if (n === 1) {
        fusedSingle(m, i, openList[0]!);
        continue;
      }
      // Nothing open (or several switches at once): fall back to the two-pass path below.
      fused[m] = 2;
    }
    // 1. continuation
    for (const m of rolled) {
      if (fused[m] === 1) continue;
      const c = cont[m]!;
      if (i === steps) {
        c.fill(0);
        continue;
      }
      const w = value[m]!;
      const up = pu;
      const down = pd;
      for (let j = 0; j <= i; j++) c[j] = up * w[j + 1]! + down * w[j]!;
    }
    // 2. exercise, for modes with a switch open at this step; 3. decisions and boundaries.
    let swappedCount = 0;
    for (const m of rolled) {
      if (fused[m] === 1) continue;
      if (fused[m] === 2) fused[m] = 1;
      const n = openAt(m, i);
      if (n === 0) {
        swapped[swappedCount++] = m;
        continue;
      }
      const list = byMode[m]!;
      const c = cont[m]!;
      const w = value[m]!;
      const row = m * width + i;
      if (decisions) decisions.rowFirst[row] = decisions.length;
      let previous = -1;
      let v = lowest[i]!;
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
        if (decisions && choice !== previous) {
          decisions.push(j, choice);
          previous = choice;
        }
        v *= ratio;
      }
      if (decisions) {
        decisions.rowCount[row] = decisions.length - decisions.rowFirst[row]!;
        recordBoundaries(m, i);
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
    rootOption: Float64Array.from(value, (row) => row[0] ?? 0),
    decisions,
    boundaryLow,
    boundaryHigh,
    grid,
    capture,
  };
}
