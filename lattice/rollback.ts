/**
 * The backward induction (docs/engine.md §4), written once. Time runs backwards from the
 * horizon; at every node and for every mode the order is:
 *   1. continuation: the discounted risk-neutral expectation of the mode's value one step on
 *      (at the horizon there is no step on, so the continuation is the mode's own value);
 *   2. exercise: the best of continuing and of each switch open from the mode at this step,
 *      each switch worth the *continuation* of the mode it leads to minus its cost (so at most
 *      one switch per mode per node, and a switch never chains into another at the same node);
 *      a switch wins only if better than continuing by more than rounding (`TIE`), so ties
 *      continue whatever the order of the arithmetic;
 *   3. record the decision (run-length encoded, see decision-runs.ts) and, where the choice
 *      changes between two nodes, the project value at which it changes, located between them.
 * Values are rolled back as O = W − A (see plan.ts), so step 1 is a plain discounted average of
 * O and step 2 adds the closed-form difference A_to − A_from = Δscale·V + offset. A mode with no
 * switch out of it has O ≡ 0 and is not rolled at all.
 *
 * The reference schedule computes every continuation first and runs the exercise rule after
 * (`exerciseRow`). The fast paths are optimisations of it, never second definitions: when no
 * switch path leads back to a mode (one-shot rights), modes are rolled targets first and each
 * does steps 1–3 in one loop (`onePassRow`, `fusedSingle`); a row whose one switch leads to a
 * fixed mode also skips its pure-exercise and zero regions, recording each skipped run as one
 * decision run (`trimmedSingle`). tests/lattice/one-rule
 * proves them equal to the reference over random models: values, decisions at every node,
 * boundaries and probabilities.
 *
 * The hot loops allocate nothing, call no closure per node and never call Math.pow: V at node
 * (i, j) is lowest[i]·rise[j], one product of two tables, so every path computes the same bits
 * for the same node (a running product drifts in its last bits with j, and a row that starts
 * part-way would differ from one that starts at node 0). The work lives in methods of one class
 * (stable call targets for the JIT) that copy what they read into locals first.
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
  /** Run the reference schedule only (every continuation first, then the exercise rule): the
   * rule the fast paths are proven against. */
  reference: boolean;
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

/**
 * A switch is taken only where it beats continuing by more than TIE times the money in its
 * terms at that node (|Δscale·V| + |offset| + |continuation it leads to|). Where the two are
 * equal in exact arithmetic — a right to expand with no payout and r = 0, whose waiting costs
 * nothing — the backward induction's rounding (about 1e-16 of those terms a step) decided
 * instead, so the same model could report early exercise and a boundary at one step count and
 * none at the next, and the trimmed rows could decide otherwise than the full ones. 1e-11 is
 * far above that noise even after 10,000 steps and far below any figure the engine reports.
 */
export const TIE = 1e-11;

const none: RollbackOptions = { decisions: false, gridSteps: -1, captureStep: -1, reference: false };

export function rollback(plan: LatticePlan, options: Partial<RollbackOptions> = {}): RollbackResult {
  return new Rollback(plan, { ...none, ...options }).run();
}

class Rollback {
  private readonly width: number;
  private readonly ratio: number;
  private readonly pu: number;
  private readonly pd: number;
  /** value[m]: O of mode m at the step being rolled (in place); cont[m]: its continuation. */
  private readonly value: Float64Array[] = [];
  private readonly cont: Float64Array[] = [];
  private readonly rolled: number[] = [];
  /** 1 when the mode's only targets are fixed modes and nothing leads into it. */
  private readonly fused: Uint8Array;
  /** 1 when some switch leads into the mode, so its continuation must be kept. */
  private readonly needed: Uint8Array;
  private readonly order: number[] | null;
  private readonly openList: Int32Array;
  private readonly decisions: DecisionRuns | null;
  private readonly boundaryLow: Float64Array | null;
  private readonly boundaryHigh: Float64Array | null;
  /**
   * Trimming of single-switch fused modes (see trimmedSingle): per mode, `edge` is the first
   * node past the pure-exercise region (Δscale < 0: nodes below it are exercised; Δscale > 0:
   * nodes from it up are exercised) and `live` the last (Δscale < 0) or first (Δscale > 0)
   * node that may hold a non-zero value; beyond it every value is exactly 0.
   */
  private readonly trims: Uint8Array;
  private readonly edge: Int32Array;
  private readonly live: Int32Array;
  /** Values below this (money) are zero for every purpose; flushing them lets the rows trim. */
  private readonly tiny: number;
  /** The choice last recorded in the trimmed row being rolled (-1: none yet). */
  private marked = -1;

  constructor(
    private readonly plan: LatticePlan,
    private readonly opts: RollbackOptions,
  ) {
    const { steps, modeCount, byMode, to, switchCount } = plan;
    this.width = steps + 1;
    this.ratio = plan.u / plan.d;
    this.pu = plan.discount * plan.p;
    this.pd = plan.discount * (1 - plan.p);
    // A mode with no switch out of it is worth its closed form for good: O ≡ 0 (shared zeros).
    const zeros = new Float64Array(this.width + 1);
    for (let m = 0; m < modeCount; m++) {
      const rolls = byMode[m]!.length > 0;
      this.value.push(rolls ? new Float64Array(this.width + 1) : zeros);
      this.cont.push(rolls ? new Float64Array(this.width + 1) : zeros);
      if (rolls) this.rolled.push(m);
    }
    this.needed = new Uint8Array(modeCount);
    for (let s = 0; s < switchCount; s++) this.needed[to[s]!] = 1;
    const snapshots = opts.gridSteps >= 0 || opts.captureStep >= 0;
    this.fused = new Uint8Array(modeCount);
    for (const m of this.rolled) {
      if (this.needed[m] === 0 && byMode[m]!.every((s) => byMode[to[s]!]!.length === 0)) this.fused[m] = 1;
    }
    this.order = snapshots || opts.reference ? null : targetsFirst(this.rolled, byMode, to);
    this.trims = new Uint8Array(modeCount);
    this.edge = new Int32Array(modeCount);
    this.live = new Int32Array(modeCount);
    for (const m of this.rolled) {
      const list = byMode[m]!;
      if (this.fused[m] === 1 && list.length === 1 && plan.deltaScale[list[0]!] !== 0) this.trims[m] = 1;
      this.resetTrim(m, steps);
    }
    let money = 0;
    for (let k = 0; k < plan.offset.length; k++) money = Math.max(money, Math.abs(plan.offset[k]!));
    for (let k = 0; k < plan.scale.length; k++) money = Math.max(money, plan.scale[k]! * plan.lowest[0]!);
    this.tiny = 1e-17 * money;
    this.openList = new Int32Array(Math.max(1, switchCount));
    this.decisions = opts.decisions ? new DecisionRuns(modeCount, this.width) : null;
    this.boundaryLow = opts.decisions ? new Float64Array(switchCount * this.width).fill(NaN) : null;
    this.boundaryHigh = opts.decisions ? new Float64Array(switchCount * this.width).fill(NaN) : null;
  }

  run(): RollbackResult {
    const { steps, modeCount } = this.plan;
    const grid: Float64Array[][] | null = this.opts.gridSteps >= 0 ? [] : null;
    let capture: RollbackResult['capture'] = null;
    const swapped = new Int32Array(modeCount);

    for (let i = steps; i >= 0; i--) {
      if (i === this.opts.captureStep) {
        // Before step i is rolled back, `value` still holds step i + 1.
        capture = { continuation: [], value: [], next: i < steps ? this.value.map((row) => row.slice(0, i + 2)) : null };
      }
      if (this.order && i < steps) {
        for (const m of this.order) {
          const n = this.openAt(m, i);
          if (this.trims[m] === 1) {
            if (n === 1) {
              this.trimmedSingle(m, i);
              continue;
            }
            // Window closed here: make the row explicit again and roll it in full.
            this.materialize(m, i + 1);
            this.resetTrim(m, i);
          }
          if (this.fused[m] === 1 && n === 1) this.fusedSingle(m, i, this.openList[0]!);
          else if (this.decisions && n > 0) {
            // Recording decisions: the reference rule for this mode (its targets are done).
            this.continuationRow(m, i);
            this.exerciseRow(m, i, n);
          } else this.onePassRow(m, i);
        }
        continue;
      }
      // 1. every continuation first (zero at the horizon) …
      for (const m of this.rolled) {
        const c = this.cont[m]!;
        if (i === steps) c.fill(0);
        else this.continuationRow(m, i);
      }
      // … 2–3. then the exercise rule; modes with nothing open keep their continuation, by a
      // buffer swap after every mode has read the continuations it needs.
      let swappedCount = 0;
      for (const m of this.rolled) {
        const n = this.openAt(m, i);
        if (n === 0) swapped[swappedCount++] = m;
        else this.exerciseRow(m, i, n);
      }
      for (let k = 0; k < swappedCount; k++) {
        const m = swapped[k]!;
        const t = this.value[m]!;
        this.value[m] = this.cont[m]!;
        this.cont[m] = t;
      }
      if (grid && i <= this.opts.gridSteps) grid[i] = this.value.map((row) => row.slice(0, i + 1));
      if (capture && i === this.opts.captureStep) {
        // For swapped modes the continuation now sits in value; it equals the value there.
        const kept = Array.from(swapped.subarray(0, swappedCount));
        capture.continuation = this.value.map((row, m) => (kept.includes(m) ? row.slice(0, i + 1) : this.cont[m]!.slice(0, i + 1)));
        capture.value = this.value.map((row) => row.slice(0, i + 1));
      }
    }
    // Trimmed rows keep their pure-exercise nodes implicit: write the root out.
    for (const m of this.rolled) if (this.trims[m] === 1 && this.order) this.materialize(m, 0);
    return {
      rootOption: Float64Array.from(this.value, (row) => row[0] ?? 0),
      decisions: this.decisions,
      boundaryLow: this.boundaryLow,
      boundaryHigh: this.boundaryHigh,
      grid,
      capture,
    };
  }

  /** Collects the open switches of mode m at step i into openList (as indices into byMode[m]). */
  private openAt(m: number, i: number): number {
    const list = this.plan.byMode[m]!;
    const open = this.plan.open;
    const width = this.width;
    const openList = this.openList;
    let n = 0;
    for (let k = 0; k < list.length; k++) if (open[list[k]! * width + i] === 1) openList[n++] = k;
    return n;
  }

  private continuationRow(m: number, i: number) {
    const w = this.value[m]!;
    const c = this.cont[m]!;
    const up = this.pu;
    const down = this.pd;
    for (let j = 0; j <= i; j++) c[j] = up * w[j + 1]! + down * w[j]!;
  }

  /**
   * Steps 1–3 for a fused mode with one open switch, in place (j ascending reads w[j+1]
   * unchanged). With decisions it records the runs and locates each change of choice between
   * nodes exactly as exerciseRow does, from the two choices' values at both nodes.
   */
  private fusedSingle(m: number, i: number, k: number) {
    const plan = this.plan;
    const width = this.width;
    const w = this.value[m]!;
    const s = plan.byMode[m]![k]!;
    const ds = plan.deltaScale[s]!;
    const off = plan.offset[s * width + i]!;
    const up = this.pu;
    const down = this.pd;
    const base = plan.lowest[i]!;
    const rise = plan.rise;
    const tieV = TIE * Math.abs(ds);
    const tieOff = TIE * Math.abs(off);
    const decisions = this.decisions;
    if (!decisions) {
      for (let j = 0; j <= i; j++) {
        const v = base * rise[j]!;
        const hold = up * w[j + 1]! + down * w[j]!;
        const x = ds * v + off;
        w[j] = x - hold > tieV * v + tieOff ? x : hold;
      }
      return;
    }
    const row = m * width + i;
    decisions.rowFirst[row] = decisions.length;
    let previous = -1;
    let gapBelow = 0;
    for (let j = 0; j <= i; j++) {
      const v = base * rise[j]!;
      const hold = up * w[j + 1]! + down * w[j]!;
      const x = ds * v + off;
      const taken = x - hold > tieV * v + tieOff;
      const choice = taken ? k + 1 : 0;
      w[j] = taken ? x : hold;
      if (choice !== previous) {
        decisions.push(j, choice);
        // g = value(new choice) − value(old choice), at node j − 1 and here.
        if (previous >= 0) this.placeEdge(m, i, previous, choice, j, choice === 0 ? -gapBelow : gapBelow, choice === 0 ? hold - x : x - hold);
        else if (choice !== 0) this.boundaryLow![s * width + i] = -Infinity;
        previous = choice;
      }
      gapBelow = x - hold;
    }
    if (previous > 0) this.boundaryHigh![s * width + i] = Infinity;
    decisions.rowCount[row] = decisions.length - decisions.rowFirst[row]!;
  }

  /** Trim state meaning "every node of step t is stored explicitly". */
  private resetTrim(m: number, t: number) {
    const s = this.plan.byMode[m]![0];
    const falling = s !== undefined && this.plan.deltaScale[s]! < 0;
    this.edge[m] = falling ? 0 : t + 1;
    this.live[m] = falling ? t : 0;
  }

  /** Writes the implicit pure-exercise values of step t into the row, so it can be read in full. */
  private materialize(m: number, t: number) {
    if (this.trims[m] !== 1) return;
    const plan = this.plan;
    const s = plan.byMode[m]![0]!;
    const ds = plan.deltaScale[s]!;
    const off = plan.offset[s * this.width + Math.min(t, plan.steps)]!;
    const w = this.value[m]!;
    const from = ds < 0 ? 0 : this.edge[m]!;
    const to = ds < 0 ? this.edge[m]! : t + 1;
    const base = plan.lowest[t]!;
    for (let j = from; j < to; j++) w[j] = ds * (base * plan.rise[j]!) + off;
  }

  /**
   * Steps 1–3 for a fused mode whose one switch leads to a fixed mode, computing only the nodes
   * that can change. Its exercise value x = Δscale·V + offset is linear in V, so:
   * - where both children were exercised at step i+1 the continuation is linear in V too, and
   *   the exercise test reduces to one linear inequality; checked at both ends of that run, it
   *   holds throughout (a half-line), so the run stays exercised without visiting its nodes;
   * - where both children were 0 the continuation is 0 and the node is worth max(x, 0), which is
   *   0 past the point where x turns negative;
   * - values below `tiny` are flushed to 0, so the zero region grows as the value decays.
   * Only the nodes in between are computed. The numbers equal the full loop's (the tests compare
   * the trimmed engine with quantlib.js at 1e-9 and with itself untrimmed). With decisions, each
   * skipped run is one decision run, and a change of choice at a run's end is located from the
   * two nodes beside it exactly as the full loop does (x − continuation at both; the skipped
   * node's continuation is computed from its children's closed form).
   */
  private trimmedSingle(m: number, i: number) {
    const plan = this.plan;
    const width = this.width;
    const s = plan.byMode[m]![0]!;
    const ds = plan.deltaScale[s]!;
    const off = plan.offset[s * width + i]!;
    const offNext = plan.offset[s * width + i + 1]!;
    const w = this.value[m]!;
    const up = this.pu;
    const down = this.pd;
    const step = this.ratio;
    const tiny = this.tiny;
    const base = plan.lowest[i]!;
    const rise = plan.rise;
    const vAt = (j: number) => base * (j >= 0 ? rise[j]! : 1 / step);
    // Continuation of a node whose children are both exercised: ds·G·V + D·offNext.
    const G = (plan.lowest[i + 1]! / base) * (up * step + down);
    const D = up + down;
    const tieV = TIE * Math.abs(ds);
    const tieOff = TIE * Math.abs(off);
    // The test x − continuation > TIE·(|Δscale|·V + |offset|) is linear in V on such a run.
    const staysExercised = (j: number) => ds * vAt(j) + off - (ds * G * vAt(j) + D * offNext) > tieV * vAt(j) + tieOff;
    const edgeNext = this.edge[m]!;
    const liveNext = this.live[m]!;
    // A child's value at step i + 1 before this row overwrites it: implicit in the pure region.
    const exercisedChild = (c: number) => ds * (plan.lowest[i + 1]! * rise[c]!) + offNext;
    const decisions = this.decisions;
    if (decisions) {
      this.marked = -1;
      decisions.rowFirst[m * width + i] = decisions.length;
    }

    if (ds < 0) {
      // Exercised at the bottom, zero at the top.
      let pure = Math.max(0, edgeNext - 1);
      if (pure > 0 && !(staysExercised(0) && staysExercised(pure - 1))) pure = 0;
      let gap = 0; // x − continuation at the node before the one being computed
      if (decisions && pure > 0) {
        this.mark(m, i, s, 0, 1, 0, 0);
        const below = pure - 1;
        gap = ds * vAt(below) + off - (up * exercisedChild(pure) + down * exercisedChild(below));
      }
      if (pure === 0 && edgeNext > 0) this.materialize(m, i + 1);
      // The first computed node reads one child inside the pure region: write that child out.
      else if (edgeNext > 0) w[edgeNext - 1] = exercisedChild(edgeNext - 1);
      let edge = pure;
      let streak = true;
      let last = pure - 1;
      const end = Math.min(i, liveNext);
      let j = pure;
      for (; j <= end; j++) {
        const v = base * rise[j]!;
        let hold = up * w[j + 1]! + down * w[j]!;
        if (hold < tiny && hold > -tiny) hold = 0;
        const x = ds * v + off;
        const taken = x - hold > tieV * v + tieOff;
        if (taken) {
          w[j] = x;
          if (streak) edge = j + 1;
          last = j;
        } else {
          w[j] = hold;
          streak = false;
          if (hold !== 0) last = j;
        }
        if (decisions) {
          if ((taken ? 1 : 0) !== this.marked) this.mark(m, i, s, j, taken ? 1 : 0, gap, x - hold);
          gap = x - hold;
        }
      }
      // Above the live region the continuation is 0: exercised while x beats 0 (by more than TIE), zero after.
      for (; j <= i; j++) {
        const v = base * rise[j]!;
        const x = ds * v + off;
        const taken = x > tieV * v + tieOff;
        if (decisions && (taken ? 1 : 0) !== this.marked) this.mark(m, i, s, j, taken ? 1 : 0, gap, x);
        if (!taken) break;
        w[j] = x;
        if (streak) edge = j + 1;
        last = j;
        gap = x;
      }
      this.edge[m] = edge;
      this.live[m] = Math.max(last, edge - 1);
    } else {
      // Zero at the bottom, exercised at the top.
      // A row rolled in full at step i + 1 has its edge past that row's end (resetTrim).
      let pure = Math.min(edgeNext, i + 1);
      if (pure <= i && !(staysExercised(pure) && staysExercised(i))) pure = i + 1;
      // The pure region's first node, read before the children are overwritten (with decisions).
      const pureGap = decisions && pure <= i ? ds * vAt(pure) + off - (up * exercisedChild(pure + 1) + down * exercisedChild(pure)) : 0;
      if (pure > i && edgeNext <= i + 1) {
        this.materialize(m, i + 1);
      } else if (edgeNext <= i + 1) w[edgeNext] = exercisedChild(edgeNext);
      const start = Math.max(0, liveNext - 1);
      // Below the live region the continuation is 0: worth max(x, 0), x falling with j.
      let first = start;
      for (let jj = start - 1; jj >= 0; jj--) {
        const v = base * rise[jj]!;
        const x = ds * v + off;
        if (!(x > tieV * v + tieOff)) break;
        w[jj] = x;
        first = jj;
      }
      let gap = 0;
      if (decisions) {
        // Nodes below `first` continue (worth 0), those from it to `start` are exercised.
        if (first > 0) this.mark(m, i, s, 0, 0, 0, 0);
        if (first < start) this.mark(m, i, s, first, 1, ds * vAt(first - 1) + off, ds * vAt(first) + off);
        gap = ds * vAt(start - 1) + off;
      }
      let firstNonZero = first < start ? first : -1;
      let streakStart = first < start ? first : -1;
      for (let j = start; j < pure; j++) {
        const v = base * rise[j]!;
        let hold = up * w[j + 1]! + down * w[j]!;
        if (hold < tiny && hold > -tiny) hold = 0;
        const x = ds * v + off;
        const taken = x - hold > tieV * v + tieOff;
        if (taken) {
          w[j] = x;
          if (streakStart < 0) streakStart = j;
          if (firstNonZero < 0) firstNonZero = j;
        } else {
          w[j] = hold;
          streakStart = -1;
          if (firstNonZero < 0 && hold !== 0) firstNonZero = j;
        }
        if (decisions) {
          if ((taken ? 1 : 0) !== this.marked) this.mark(m, i, s, j, taken ? 1 : 0, gap, x - hold);
          gap = x - hold;
        }
      }
      if (decisions && pure <= i && this.marked !== 1) this.mark(m, i, s, pure, 1, gap, pureGap);
      this.edge[m] = streakStart >= 0 ? streakStart : pure;
      this.live[m] = firstNonZero >= 0 ? firstNonZero : Math.min(pure, i + 1);
    }
    if (decisions) {
      if (this.marked === -1) this.mark(m, i, s, 0, 0, 0, 0);
      if (this.marked === 1) this.boundaryHigh![s * width + i] = Infinity;
      const row = m * width + i;
      decisions.rowCount[row] = decisions.length - decisions.rowFirst[row]!;
    }
  }

  /**
   * Records, in a trimmed row, that the choice becomes `choice` (0: continue, 1: the switch) at
   * node j, where x − continuation is gapBelow at node j − 1 and gapHere at j; the change is
   * located between the two nodes as in the full loop.
   */
  private mark(m: number, i: number, s: number, j: number, choice: number, gapBelow: number, gapHere: number) {
    this.decisions!.push(j, choice);
    if (this.marked >= 0) this.placeEdge(m, i, this.marked, choice, j, choice === 0 ? -gapBelow : gapBelow, choice === 0 ? -gapHere : gapHere);
    else if (choice !== 0) this.boundaryLow![s * this.width + i] = -Infinity;
    this.marked = choice;
  }

  /** Steps 1–3 in one loop for mode m at step i < N (modes rolled targets first, see `order`). */
  private onePassRow(m: number, i: number) {
    const plan = this.plan;
    const width = this.width;
    const n = this.openAt(m, i);
    const w = this.value[m]!;
    const c = this.cont[m]!;
    const keep = this.needed[m] === 1;
    const up = this.pu;
    const down = this.pd;
    if (n === 0) {
      for (let j = 0; j <= i; j++) {
        const hold = up * w[j + 1]! + down * w[j]!;
        w[j] = hold;
        if (keep) c[j] = hold;
      }
      return;
    }
    const list = plan.byMode[m]!;
    const openList = this.openList;
    const cont = this.cont;
    const base = plan.lowest[i]!;
    const rise = plan.rise;
    const s1 = list[openList[0]!]!;
    const ds1 = plan.deltaScale[s1]!;
    const off1 = plan.offset[s1 * width + i]!;
    const c1 = cont[plan.to[s1]!]!;
    const s2 = list[openList[n >= 2 ? 1 : 0]!]!; // read only when n ≥ 2
    const ds2 = plan.deltaScale[s2]!;
    const off2 = plan.offset[s2 * width + i]!;
    const c2 = cont[plan.to[s2]!]!;
    const tie = TIE;
    const tieV1 = tie * Math.abs(ds1);
    const tieOff1 = tie * Math.abs(off1);
    const tieV2 = tie * Math.abs(ds2);
    const tieOff2 = tie * Math.abs(off2);
    if (n === 1) {
      // One switch open (the common case): the same rule without the loop over the others.
      for (let j = 0; j <= i; j++) {
        const v = base * rise[j]!;
        const hold = up * w[j + 1]! + down * w[j]!;
        if (keep) c[j] = hold;
        const c1j = c1[j]!;
        const x1 = ds1 * v + off1 + c1j;
        w[j] = x1 > hold && x1 - hold > tieV1 * v + tieOff1 + tie * Math.abs(c1j) ? x1 : hold;
      }
      return;
    }
    for (let j = 0; j <= i; j++) {
      const v = base * rise[j]!;
      const hold = up * w[j + 1]! + down * w[j]!;
      if (keep) c[j] = hold;
      let best = hold;
      const c1j = c1[j]!;
      const x1 = ds1 * v + off1 + c1j;
      // The margin is computed only where the switch beats continuing at all.
      if (x1 > hold && x1 - hold > tieV1 * v + tieOff1 + tie * Math.abs(c1j)) best = x1;
      const c2j = c2[j]!;
      const x2 = ds2 * v + off2 + c2j;
      if (x2 > best && x2 - hold > tieV2 * v + tieOff2 + tie * Math.abs(c2j)) best = x2;
      for (let q = 2; q < n; q++) {
        const s = list[openList[q]!]!;
        const dsq = plan.deltaScale[s]!;
        const offq = plan.offset[s * width + i]!;
        const cq = cont[plan.to[s]!]![j]!;
        const x = dsq * v + offq + cq;
        if (x > best && x - hold > tie * (Math.abs(dsq) * v + Math.abs(offq) + Math.abs(cq))) best = x;
      }
      w[j] = best;
    }
  }

  /** The value at node j of choice k (0: continue; k: the mode's k-th switch), continuations computed. */
  private choiceValue(m: number, i: number, j: number, k: number, v: number): number {
    if (k === 0) return this.cont[m]![j]!;
    const plan = this.plan;
    const s = plan.byMode[m]![k - 1]!;
    return plan.deltaScale[s]! * v + plan.offset[s * this.width + i]! + this.cont[plan.to[s]!]![j]!;
  }

  /**
   * Steps 2–3 for mode m at step i with n switches open (in openList), continuations computed:
   * the reference rule. Records the decision runs and, where the choice changes between nodes
   * j − 1 and j, locates the project value at which it changes: the two choices' values differ
   * by g = value(new) − value(old), g ≤ 0 at j − 1 and g > 0 at j, and g is interpolated
   * linearly in V between the nodes. So an exercise region's edges lie between nodes, inside the
   * tree, and converge as steps grow (the nearest exercised node is off by up to a node spacing).
   */
  private exerciseRow(m: number, i: number, n: number) {
    const plan = this.plan;
    const width = this.width;
    const list = plan.byMode[m]!;
    const openList = this.openList;
    const cont = this.cont;
    const c = cont[m]!;
    const w = this.value[m]!;
    const decisions = this.decisions;
    const row = m * width + i;
    if (decisions) decisions.rowFirst[row] = decisions.length;
    let previous = -1;
    const base = plan.lowest[i]!;
    const rise = plan.rise;
    if (n === 1) {
      // One switch open (the common case): the same rule with its terms read once.
      const k = openList[0]!;
      const s = list[k]!;
      const ds = plan.deltaScale[s]!;
      const off = plan.offset[s * width + i]!;
      const ct = cont[plan.to[s]!]!;
      const tieV = TIE * Math.abs(ds);
      const tieOff = TIE * Math.abs(off);
      for (let j = 0; j <= i; j++) {
        const v = base * rise[j]!;
        const hold = c[j]!;
        const x = ds * v + off + ct[j]!;
        const taken = x - hold > tieV * v + tieOff + TIE * Math.abs(ct[j]!);
        const choice = taken ? k + 1 : 0;
        w[j] = taken ? x : hold;
        if (decisions && choice !== previous) {
          decisions.push(j, choice);
          if (previous >= 0) this.recordEdge(m, i, j, previous, choice);
          else if (choice !== 0) this.boundaryLow![s * width + i] = -Infinity;
          previous = choice;
        }
      }
      if (decisions) {
        if (previous > 0) this.boundaryHigh![s * width + i] = Infinity;
        decisions.rowCount[row] = decisions.length - decisions.rowFirst[row]!;
      }
      return;
    }
    for (let j = 0; j <= i; j++) {
      const v = base * rise[j]!;
      const hold = c[j]!;
      let best = hold;
      let choice = 0;
      for (let q = 0; q < n; q++) {
        const k = openList[q]!;
        const s = list[k]!;
        const ds = plan.deltaScale[s]!;
        const off = plan.offset[s * width + i]!;
        const ct = cont[plan.to[s]!]![j]!;
        const x = ds * v + off + ct;
        if (x > best && x - hold > TIE * (Math.abs(ds) * v + Math.abs(off) + Math.abs(ct))) {
          best = x;
          choice = k + 1;
        }
      }
      w[j] = best;
      if (decisions && choice !== previous) {
        decisions.push(j, choice);
        if (previous >= 0) this.recordEdge(m, i, j, previous, choice);
        else if (choice !== 0) this.boundaryLow![list[choice - 1]! * width + i] = -Infinity;
        previous = choice;
      }
    }
    if (decisions) {
      if (previous > 0) this.boundaryHigh![list[previous - 1]! * width + i] = Infinity;
      decisions.rowCount[row] = decisions.length - decisions.rowFirst[row]!;
    }
  }

  /** The choice changes from `before` (up to node j − 1) to `after` (from node j) at step i. */
  private recordEdge(m: number, i: number, j: number, before: number, after: number) {
    const v = this.plan.lowest[i]! * this.plan.rise[j]!;
    const vBelow = this.plan.lowest[i]! * this.plan.rise[j - 1]!;
    const gBelow = this.choiceValue(m, i, j - 1, after, vBelow) - this.choiceValue(m, i, j - 1, before, vBelow);
    const gHere = this.choiceValue(m, i, j, after, v) - this.choiceValue(m, i, j, before, v);
    this.placeEdge(m, i, before, after, j, gBelow, gHere);
  }

  /**
   * Locates a change of choice between nodes j − 1 and j of step i where g = value(after) −
   * value(before) is gBelow ≤ 0 and gHere ≥ 0, by linear interpolation of g in V: the located
   * value closes `before`'s exercise region from above and opens `after`'s from below. The
   * lowest opening and the highest closing of each switch's row are kept.
   */
  private placeEdge(m: number, i: number, before: number, after: number, j: number, gBelow: number, gHere: number) {
    const v = this.plan.lowest[i]! * this.plan.rise[j]!;
    const vBelow = this.plan.lowest[i]! * this.plan.rise[j - 1]!;
    const share = gHere > gBelow ? -gBelow / (gHere - gBelow) : 0.5;
    const edge = vBelow + Math.min(1, Math.max(0, share)) * (v - vBelow);
    const list = this.plan.byMode[m]!;
    const width = this.width;
    const low = this.boundaryLow!;
    const high = this.boundaryHigh!;
    if (after > 0) {
      const cell = list[after - 1]! * width + i;
      if (!(edge >= low[cell]!)) low[cell] = edge;
    }
    if (before > 0) {
      const cell = list[before - 1]! * width + i;
      if (!(edge <= high[cell]!)) high[cell] = edge;
    }
  }
}

/**
 * The rolled modes ordered so that every switch's target comes before its source, or null when
 * switches form a cycle (reversible rights such as mothball and restart).
 */
function targetsFirst(rolled: number[], byMode: Int32Array[], to: Int32Array): number[] | null {
  const state = new Map<number, 'visiting' | 'done'>();
  const order: number[] = [];
  const isRolled = new Set(rolled);
  const visit = (m: number): boolean => {
    const seen = state.get(m);
    if (seen === 'done') return true;
    if (seen === 'visiting') return false;
    state.set(m, 'visiting');
    for (const s of byMode[m]!) {
      const target = to[s]!;
      if (isRolled.has(target) && !visit(target)) return false;
    }
    state.set(m, 'done');
    order.push(m);
    return true;
  };
  for (const m of rolled) if (!visit(m)) return null;
  return order;
}
