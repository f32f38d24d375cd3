/**
 * Turns a compiled model into the flat numeric plan the backward induction reads: the tree's
 * step, the lowest node of every step (the rest follow by multiplying by u/d), and for every
 * switch the change of scale and, per step, its open flag and constant offset. Everything that
 * depends only on the step is computed here once, so the per-node loop does arithmetic only.
 *
 * Each mode's value is split as W = A + O, where A is the value of staying in the mode for
 * good (scale·V + PV of its flows and terminal value, known in closed form) and O is the value
 * of the rights still open from it. The lattice rolls back O only. On trees that match the
 * first moment exactly (CRR, Tian) this is the textbook rollback of docs/engine.md §4 to rounding;
 * on Jarrow–Rudd and Trigeorgis it removes the tree's small drift error from V itself (a
 * control variate), so a project with no rights is worth exactly its closed form on every tree
 * and an abandon-only project is V0 plus the same tree's American put.
 */
import type { CompiledModel } from './compiled';
import { costAt } from './cost';
import { refuse } from './errors';
import type { ProjectModel, TreeKind } from './schema';
import { treeStep } from './tree';
import type { Snap } from './window';
import { openSteps } from './window';

export interface LatticePlan {
  kind: TreeKind;
  steps: number;
  dt: number;
  u: number;
  d: number;
  p: number;
  discount: number;
  /** V at the lowest node (j = 0) of each step, after the payouts of earlier steps. */
  lowest: Float64Array;
  /** (u/d)^j for j = 0..N, so V(i, j) = lowest[i]·rise[j] without Math.pow. */
  rise: Float64Array;
  /**
   * Fraction of V left in the project after the payouts of step i (from t_i to t_{i+1}):
   * e^{−δΔt} times the step's share of period payouts and lumps. The continuous yield only tilts
   * p (the tree grows at r − δ); the rest moves the next step's nodes down by that share.
   */
  kept: Float64Array;
  modeCount: number;
  scale: Float64Array;
  /** PV at step i of the mode's flows from step i on and its terminal value: [mode·(N+1) + i]. */
  fixed: Float64Array;
  switchCount: number;
  from: Int32Array;
  to: Int32Array;
  deltaScale: Float64Array;
  /** [switch·(N+1) + i]: fixed_to(i) − fixed_from(i) − cost(t_i). */
  offset: Float64Array;
  /** [switch·(N+1) + i]: 1 when the switch may be exercised at step i. */
  open: Uint8Array;
  /** The switches leaving each mode, as indices into the switch arrays. */
  byMode: Int32Array[];
  snaps: Snap[];
}

export function buildPlan(model: ProjectModel, compiled: CompiledModel, steps = model.steps): LatticePlan {
  const kind = model.tree ?? 'crr';
  const dt = model.horizon / steps;
  const r = model.riskFreeRate;
  const delta = model.underlying.payoutYield ?? 0;
  const { u, d, p } = treeStep(kind, { volatility: model.underlying.volatility, riskFreeRate: r, payoutYield: delta, dt });
  const discount = Math.exp(-r * dt);
  const snaps: Snap[] = [];
  const width = steps + 1;

  const retained = new Float64Array(width).fill(1);
  // A lump paid on a date belongs to the step that ends there (docs/engine.md §4): the mode
  // held during that step receives it and a decision on the date sees the value after it. A
  // lump at t = 0 is paid in the first step.
  (model.underlying.payouts ?? []).forEach((payout, k) => {
    const mask = openSteps({ kind: 'european', at: payout.at }, dt, steps, `underlying.payouts[${k}]`, snaps);
    const i = Math.max(0, mask.indexOf(1) - 1);
    if (i < steps) retained[i] = retained[i]! * (1 - payout.fraction);
  });
  // A payout earned over a period is paid as a constant yield over it, δ = −ln(1 − f)/length,
  // so the value left after the period is the same as after a lump of f at its end, and no
  // date inside or at the end of the period collects the period's cash at a new scale.
  (model.underlying.payoutPeriods ?? []).forEach((period) => {
    const yieldRate = -Math.log(1 - period.fraction) / (period.to - period.from);
    for (let i = Math.floor(period.from / dt); i < steps && i * dt < period.to; i++) {
      const overlap = Math.min(period.to, (i + 1) * dt) - Math.max(period.from, i * dt);
      if (overlap > 0) retained[i] = retained[i]! * Math.exp(-yieldRate * overlap);
    }
  });
  const kept = retained.map((x) => x * Math.exp(-delta * dt));
  kept[steps] = 1;
  // The highest node is V0·u^N: refuse before it overflows rather than return Infinity.
  const logTop = Math.log(model.underlying.value) + steps * Math.log(u);
  const logBottom = Math.log(model.underlying.value) + steps * Math.log(d);
  if (!(logTop < 600) || !(logBottom > -600))
    refuse(
      'underlying.volatility',
      `with this horizon and step count spreads the lattice from e^${logBottom.toFixed(0)} to e^${logTop.toFixed(0)}, beyond what can be computed; lower the volatility, horizon or steps`,
    );
  const lowest = new Float64Array(width);
  lowest[0] = model.underlying.value;
  for (let i = 0; i < steps; i++) lowest[i + 1] = lowest[i]! * retained[i]! * d;

  const rise = new Float64Array(width);
  rise[0] = 1;
  for (let j = 1; j < width; j++) rise[j] = rise[j - 1]! * (u / d);

  const modeCount = compiled.modes.length;
  const scale = new Float64Array(modeCount);
  const fixed = new Float64Array(modeCount * width);
  compiled.modes.forEach((mode, m) => {
    scale[m] = mode.scale;
    const row = m * width;
    fixed[row + steps] = mode.terminal;
    for (let i = steps - 1; i >= 0; i--) fixed[row + i] = mode.flowPerYear * dt + discount * fixed[row + i + 1]!;
  });

  const switchCount = compiled.switches.length;
  const from = new Int32Array(switchCount);
  const to = new Int32Array(switchCount);
  const deltaScale = new Float64Array(switchCount);
  const offset = new Float64Array(switchCount * width);
  const open = new Uint8Array(switchCount * width);
  const reported = new Set<string>();
  compiled.switches.forEach((sw, s) => {
    from[s] = sw.from;
    to[s] = sw.to;
    deltaScale[s] = scale[sw.to]! - scale[sw.from]!;
    // One window can be shared by several compiled switches; report its snaps once.
    const windowSnaps: Snap[] = [];
    open.set(openSteps(sw.window, dt, steps, `${sw.field}.window`, windowSnaps), s * width);
    for (const snap of windowSnaps) {
      const key = `${snap.field}@${snap.requested}`;
      if (!reported.has(key)) {
        reported.add(key);
        snaps.push(snap);
      }
    }
    for (let i = 0; i <= steps; i++) {
      offset[s * width + i] = fixed[sw.to * width + i]! - fixed[sw.from * width + i]! - costAt(sw.cost, i * dt);
    }
  });
  const byMode = compiled.modes.map((_, m) => Int32Array.from(compiled.switches.flatMap((sw, s) => (sw.from === m ? [s] : []))));

  return { kind, steps, dt, u, d, p, discount, lowest, rise, kept, modeCount, scale, fixed, switchCount, from, to, deltaScale, offset, open, byMode, snaps };
}
