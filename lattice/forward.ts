/**
 * Risk-neutral probability and timing of each right's first exercise, by a forward pass over
 * the decision map: probability mass starts at the root in the start mode, moves to the target
 * mode wherever a switch is taken, and spreads to (i+1, j+1) with p and (i+1, j) with 1 − p.
 * One pass per right: mass that exercises the right is set aside as "exercised at t_i", so
 * reversible rights (mothball/restart) are counted once, at their first use. The map is read
 * run by run, so each run is one tight loop.
 */
import type { DecisionRuns } from './decision-runs';
import type { LatticePlan } from './plan';

export interface ExerciseProfile {
  probability: number;
  /** Probability of first exercise at each step (length N + 1). */
  byStep: Float64Array;
}

export function exerciseProfiles(plan: LatticePlan, decisions: DecisionRuns, rightOfSwitch: Int32Array, rightCount: number, start: number): ExerciseProfile[] {
  const { steps, p, modeCount, byMode, to } = plan;
  const width = steps + 1;
  const q = 1 - p;
  const profiles: ExerciseProfile[] = [];
  let mass: Float64Array[] = [];
  let next: Float64Array[] = [];
  for (let m = 0; m < modeCount; m++) {
    mass.push(new Float64Array(width + 1));
    next.push(new Float64Array(width + 1));
  }
  let live = new Uint8Array(modeCount);
  let liveNext = new Uint8Array(modeCount);

  /** Spreads mass[a..b] of one mode to the next step of mode `target`. */
  function spread(row: Float64Array, a: number, b: number, target: number) {
    const out = next[target]!;
    liveNext[target] = 1;
    for (let j = a; j <= b; j++) {
      const x = row[j]!;
      out[j + 1] = out[j + 1]! + p * x;
      out[j] = out[j]! + q * x;
    }
  }

  for (let r = 0; r < rightCount; r++) {
    const byStep = new Float64Array(width);
    for (let m = 0; m < modeCount; m++) mass[m]!.fill(0);
    live.fill(0);
    mass[start]![0] = 1;
    live[start] = 1;
    for (let i = 0; i <= steps; i++) {
      // `next` holds step i − 1's mass: clear it before step i + 1 is spread into it.
      for (let m = 0; m < modeCount; m++) next[m]!.fill(0, 0, i + 2);
      liveNext.fill(0);
      for (let m = 0; m < modeCount; m++) {
        if (live[m] !== 1) continue;
        const row = mass[m]!;
        const rowIndex = m * width + i;
        const first = decisions.rowFirst[rowIndex]!;
        const count = decisions.rowCount[rowIndex]!;
        if (count === 0) {
          if (i < steps) spread(row, 0, i, m);
          continue;
        }
        for (let k = first; k < first + count; k++) {
          const a = decisions.starts[k]!;
          const b = k + 1 < first + count ? decisions.starts[k + 1]! - 1 : i;
          const choice = decisions.choices[k]!;
          if (choice === 0) {
            if (i < steps) spread(row, a, b, m);
            continue;
          }
          const s = byMode[m]![choice - 1]!;
          if (rightOfSwitch[s] === r) {
            let sum = 0;
            for (let j = a; j <= b; j++) sum += row[j]!;
            byStep[i] = byStep[i]! + sum;
          } else if (i < steps) spread(row, a, b, to[s]!);
        }
      }
      const spent = mass;
      mass = next;
      next = spent;
      const wasLive = live;
      live = liveNext;
      liveNext = wasLive;
    }
    let probability = 0;
    for (let i = 0; i <= steps; i++) probability += byStep[i]!;
    profiles.push({ probability, byStep });
  }
  return profiles;
}
