/**
 * When a right reads as part of the plan rather than as an option (docs/engine.md §5, premium split): used
 * later than today with a risk-neutral probability above 95 %. The engine's warning and the
 * option cards' note both ask this one function.
 */
import type { RightResult } from './result';

/** Above this risk-neutral probability of use, a right reads as part of the plan. */
export const PLAN_LIKE = 0.95;

export function isPlanLike(right: Pick<RightResult, 'exerciseProbability' | 'exerciseTiming'>): boolean {
  // A right first used today is a decision of the plan by definition; only later use is flagged.
  const usedToday = right.exerciseTiming[0]?.t === 0 ? right.exerciseTiming[0].probability : 0;
  return right.exerciseProbability > PLAN_LIKE && usedToday < PLAN_LIKE;
}
