/** Small builders for the reference models the tests value. */
import type { ProjectModel, TreeKind } from '@/lattice';

export interface VanillaCase {
  value: number;
  strike: number;
  rate: number;
  volatility: number;
  horizon: number;
  steps: number;
  payoutYield?: number;
  tree?: TreeKind;
}

/** A project that may be abandoned for `strike` at any step: V0 + an American put. */
export function abandonOnly(c: VanillaCase): ProjectModel {
  return {
    underlying: { value: c.value, volatility: c.volatility, payoutYield: c.payoutYield ?? 0 },
    riskFreeRate: c.rate,
    horizon: c.horizon,
    steps: c.steps,
    tree: c.tree ?? 'crr',
    options: [{ kind: 'abandon', salvage: c.strike, window: { kind: 'american', from: 0, to: c.horizon } }],
  };
}

/** A project that may be started for `strike` at any step until the horizon: an American call. */
export function deferOnly(c: VanillaCase): ProjectModel {
  return {
    underlying: { value: c.value, volatility: c.volatility, payoutYield: c.payoutYield ?? 0 },
    riskFreeRate: c.rate,
    horizon: c.horizon,
    steps: c.steps,
    tree: c.tree ?? 'crr',
    options: [{ kind: 'defer', cost: c.strike, window: { kind: 'american', from: 0, to: c.horizon } }],
  };
}
