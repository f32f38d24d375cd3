import type { Probability, RatePerYear, Volatility, Years } from '../units';

/** What every tree needs to know about the discretised process. */
export interface TreeInput {
  volatility: Volatility;
  riskFreeRate: RatePerYear;
  payoutYield: RatePerYear;
  dt: Years;
}

/**
 * One step of a recombining binomial tree: the value moves from V to u·V with probability p or
 * to d·V with probability 1 − p, so the node (i, j) after i steps with j up-moves holds
 * V0·u^j·d^(i−j).
 */
export interface TreeStep {
  u: number;
  d: number;
  p: Probability;
}
