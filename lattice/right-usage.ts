/**
 * Two readings of how often a right is used that say its terms make it something other than an
 * option (docs/engine.md §5, premium split): used later than today with a risk-neutral
 * probability above 95 %, it is part of the plan; never used, it adds nothing as specified. The
 * engine's warnings and the option cards' notes both ask these functions.
 */
import type { RightResult } from './result';

/** Above this risk-neutral probability of use, a right reads as part of the plan. */
export const PLAN_LIKE = 0.95;

type Usage = Pick<RightResult, 'exerciseProbability' | 'exerciseTiming'>;

export function isPlanLike(right: Usage): boolean {
  // A right first used today is a decision of the plan by definition; only later use is flagged.
  const usedToday = right.exerciseTiming[0]?.t === 0 ? right.exerciseTiming[0].probability : 0;
  return right.exerciseProbability > PLAN_LIKE && usedToday < PLAN_LIKE;
}

export function isNeverUsed(right: Usage): boolean {
  return right.exerciseProbability === 0;
}
