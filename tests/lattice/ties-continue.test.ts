/**
 * Ties continue (docs/engine.md §4). A right to invest or expand on a project that pays nothing
 * out, with r = 0, loses nothing by waiting and gains nothing by exercising early: exercise and
 * continuation are equal in exact arithmetic (Merton 1973, Bell Journal of Economics 4(1): an
 * American call on an asset with no payouts is never worth exercising early, so it is worth its
 * European value). The engine must then report no use before the window's end — no exercise
 * probability, no boundary point — at every step count, and the same value as the right with a
 * European window at its end. Before engine 4.3.0 the rollback's rounding decided such nodes:
 * the expansion below was reported used before its end with probability 0.087 at 100 steps, and
 * with a boundary at some step counts and none at others.
 * Tolerance for the values: 1e-9 relative (the same tree; a tie moves a node's value by at most
 * 1e-11 of its money).
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type ExerciseWindow, type ProjectModel } from '@/lattice';
import { expectClose } from './support/check';
import { normalCdf } from './support/normal';

const horizon = 5;
/** Each right, and the project value above which it pays at the end (cost ÷ scale added). */
const rights: Record<string, { threshold: number; add: (window: ExerciseWindow) => Pick<ProjectModel, 'options' | 'investment'> }> = {
  'defer (invest for 100)': { threshold: 100, add: (window) => ({ options: [{ kind: 'defer', cost: 100, window }] }) },
  'expand by half for 40': { threshold: 80, add: (window) => ({ investment: 80, options: [{ kind: 'expand', factor: 0.5, cost: 40, window }] }) },
};

describe('ties continue', () => {
  for (const [name, right] of Object.entries(rights))
    for (const [volatility, steps] of [
      [0.3, 100],
      [0.3, 1000],
      [0.8, 5000],
    ] as const)
      it(`${name}, r = 0, no payout, σ ${volatility}, ${steps} steps: never used before the window's end`, () => {
        const model = (window: ExerciseWindow): ProjectModel => ({
          underlying: { value: 100, volatility },
          riskFreeRate: 0,
          horizon,
          steps,
          tree: 'crr',
          ...right.add(window),
        });
        const american = valueProject(model({ kind: 'american', from: 0, to: horizon }), { extras: false });
        const european = valueProject(model({ kind: 'european', at: horizon }), { extras: false });
        const used = american.rights[0]!;
        const early = used.exerciseTiming.filter((x) => x.t < horizon - 1e-9);
        expect(early).toEqual([]);
        expect(used.boundary.filter((b) => b.t < horizon - 1e-9)).toEqual([]);
        // Used at the end where it pays: P(V_T > threshold) = N(d2) with r = 0 (lognormal V).
        // The lattice's end distribution moves in jumps of one node's probability, at most about
        // 1/√(π·steps/2), the tolerance.
        const d2 = (Math.log(100 / right.threshold) - (volatility * volatility * horizon) / 2) / (volatility * Math.sqrt(horizon));
        expectClose(used.exerciseProbability, normalCdf(d2), { abs: 1 / Math.sqrt((Math.PI * steps) / 2) }, { name, volatility, steps });
        expectClose(american.value, european.value, { rel: 1e-9 }, { name, volatility, steps });
      });
});
