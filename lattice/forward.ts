/**
 * Risk-neutral probability and timing of each right's first exercise, by a forward pass over
 * the decision map: probability mass starts at the root in the start mode, moves to the target
 * mode wherever a switch is taken, and spreads to (i+1, j+1) with p and (i+1, j) with 1 − p.
 * One pass per right: mass that exercises the right is set aside as "exercised at t_i", so
 * reversible rights (mothball/restart) are counted once, at their first use.
 */
import type { LatticePlan } from './plan';

export interface ExerciseProfile {
  probability: number;
  /** Probability of first exercise at each step (length N + 1). */
  byStep: Float64Array;
}

export function exerciseProfiles(
  plan: LatticePlan,
  decisions: Uint8Array[],
  rightOfSwitch: Int32Array,
  rightCount: number,
  start: number,
): ExerciseProfile[] {
  const { steps, p, modeCount, byMode, to } = plan;
  const width = steps + 1;
  const profiles: ExerciseProfile[] = [];
  let mass: Float64Array[] = [];
  let next: Float64Array[] = [];
  for (let m = 0; m < modeCount; m++) {
    mass.push(new Float64Array(width));
    next.push(new Float64Array(width));
  }
  for (let r = 0; r < rightCount; r++) {
    const byStep = new Float64Array(width);
    for (let m = 0; m < modeCount; m++) mass[m]!.fill(0);
    mass[start]![0] = 1;
    for (let i = 0; i <= steps; i++) {
      for (let m = 0; m < modeCount; m++) next[m]!.fill(0, 0, Math.min(width, i + 2));
      const base = (i * (i + 1)) / 2;
      for (let m = 0; m < modeCount; m++) {
        const row = mass[m]!;
        const map = decisions[m]!;
        const list = byMode[m]!;
        for (let j = 0; j <= i; j++) {
          const x = row[j]!;
          if (x === 0) continue;
          let target = m;
          const choice = map.length > 0 ? map[base + j]! : 0;
          if (choice !== 0) {
            const s = list[choice - 1]!;
            if (rightOfSwitch[s] === r) {
              byStep[i] = byStep[i]! + x;
              continue;
            }
            target = to[s]!;
          }
          if (i < steps) {
            const out = next[target]!;
            out[j + 1] = out[j + 1]! + p * x;
            out[j] = out[j]! + (1 - p) * x;
          }
        }
      }
      const t = mass;
      mass = next;
      next = t;
    }
    let probability = 0;
    for (let i = 0; i <= steps; i++) probability += byStep[i]!;
    profiles.push({ probability, byStep });
  }
  return profiles;
}
