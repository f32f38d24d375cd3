/**
 * Risk-neutral probability and timing of each right's first exercise, by a forward pass over
 * the decision map: probability mass starts at the root in the start mode, moves to the target
 * mode wherever a switch is taken, and spreads to (i+1, j+1) with p and (i+1, j) with 1 − p.
 * One pass per right: mass that exercises the right is set aside as "exercised at t_i", so
 * reversible rights (mothball/restart) are counted once, at their first use.
 *
 * The map is read run by run, each run one tight loop, and only over the nodes that hold mass:
 * mass below 1e-16 in the tails is dropped (at most about 2e-16 per mode and step, so under
 * 1e-11 in all even at 10 000 steps), which keeps the live band narrow.
 */
import type { DecisionRuns } from './decision-runs';
import type { LatticePlan } from './plan';

export interface ExerciseProfile {
  probability: number;
  /** Probability of first exercise at each step (length N + 1). */
  byStep: Float64Array;
}

const NEGLIGIBLE = 1e-16;

export function exerciseProfiles(plan: LatticePlan, decisions: DecisionRuns, rightOfSwitch: Int32Array, rightCount: number, start: number): ExerciseProfile[] {
  return Array.from({ length: rightCount }, (_, r) => new ForwardPass(plan, decisions, rightOfSwitch, start).run(r));
}

class ForwardPass {
  private mass: Float64Array[] = [];
  private next: Float64Array[] = [];
  /** Live band [lo, hi] of each mode's mass at the current step (lo > hi: no mass). */
  private lo: Int32Array;
  private hi: Int32Array;
  private nextLo: Int32Array;
  private nextHi: Int32Array;

  constructor(
    private readonly plan: LatticePlan,
    private readonly decisions: DecisionRuns,
    private readonly rightOfSwitch: Int32Array,
    private readonly start: number,
  ) {
    const width = plan.steps + 2;
    for (let m = 0; m < plan.modeCount; m++) {
      this.mass.push(new Float64Array(width));
      this.next.push(new Float64Array(width));
    }
    this.lo = new Int32Array(plan.modeCount);
    this.hi = new Int32Array(plan.modeCount);
    this.nextLo = new Int32Array(plan.modeCount);
    this.nextHi = new Int32Array(plan.modeCount);
  }

  run(right: number): ExerciseProfile {
    const { steps, modeCount, byMode, to } = this.plan;
    const width = steps + 1;
    const decisions = this.decisions;
    const byStep = new Float64Array(width);
    this.lo.fill(1);
    this.hi.fill(0);
    this.mass[this.start]![0] = 1;
    this.lo[this.start] = 0;
    this.hi[this.start] = 0;
    for (let i = 0; i <= steps; i++) {
      this.nextLo.fill(width + 1);
      this.nextHi.fill(-1);
      for (let m = 0; m < modeCount; m++) {
        const lo = this.lo[m]!;
        const hi = this.hi[m]!;
        if (lo > hi) continue;
        const row = this.mass[m]!;
        const rowIndex = m * width + i;
        const first = decisions.rowFirst[rowIndex]!;
        const count = decisions.rowCount[rowIndex]!;
        if (count === 0) {
          if (i < steps) this.spread(row, lo, hi, m);
        } else {
          for (let k = first; k < first + count; k++) {
            const a = Math.max(lo, decisions.starts[k]!);
            const b = Math.min(hi, k + 1 < first + count ? decisions.starts[k + 1]! - 1 : i);
            if (a > b) continue;
            const choice = decisions.choices[k]!;
            if (choice === 0) {
              if (i < steps) this.spread(row, a, b, m);
              continue;
            }
            const s = byMode[m]![choice - 1]!;
            if (this.rightOfSwitch[s] === right) {
              let sum = 0;
              for (let j = a; j <= b; j++) sum += row[j]!;
              byStep[i] = byStep[i]! + sum;
            } else if (i < steps) this.spread(row, a, b, to[s]!);
          }
        }
        row.fill(0, lo, hi + 1);
      }
      this.advance();
    }
    for (let m = 0; m < modeCount; m++) this.mass[m]!.fill(0);
    let probability = 0;
    for (let i = 0; i <= steps; i++) probability += byStep[i]!;
    return { probability, byStep };
  }

  /** Spreads mass[a..b] of one mode to the next step of mode `target`. */
  private spread(row: Float64Array, a: number, b: number, target: number) {
    const out = this.next[target]!;
    const p = this.plan.p;
    const q = 1 - p;
    for (let j = a; j <= b; j++) {
      const x = row[j]!;
      out[j + 1] = out[j + 1]! + p * x;
      out[j] = out[j]! + q * x;
    }
    if (a < this.nextLo[target]!) this.nextLo[target] = a;
    if (b + 1 > this.nextHi[target]!) this.nextHi[target] = b + 1;
  }

  /** Makes the next step current, dropping negligible mass at the ends of each band. */
  private advance() {
    const spent = this.mass;
    this.mass = this.next;
    this.next = spent;
    for (let m = 0; m < this.plan.modeCount; m++) {
      const row = this.mass[m]!;
      let lo = this.nextLo[m]!;
      let hi = this.nextHi[m]!;
      while (lo <= hi && row[lo]! < NEGLIGIBLE) row[lo++] = 0;
      while (hi >= lo && row[hi]! < NEGLIGIBLE) row[hi--] = 0;
      this.lo[m] = lo;
      this.hi[m] = hi;
    }
  }
}
