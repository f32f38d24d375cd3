/**
 * Tian (1993), "A modified lattice approach to option pricing", J. Futures Markets 13(5): the
 * first three moments are matched. With M = e^{(r−δ)Δt} and v = e^{σ²Δt}:
 * u, d = ½·M·v·(v + 1 ± √(v² + 2v − 3)), p = (M − d)/(u − d).
 */
import type { TreeInput, TreeStep } from './types';

export function tianStep({ volatility, riskFreeRate, payoutYield, dt }: TreeInput): TreeStep {
  const growth = Math.exp((riskFreeRate - payoutYield) * dt);
  const v = Math.exp(volatility * volatility * dt);
  // v² + 2v − 3 = (v − 1)(v + 3): the factored form keeps precision when σ²Δt is tiny.
  const root = Math.sqrt(Math.expm1(volatility * volatility * dt) * (v + 3));
  const u = 0.5 * growth * v * (v + 1 + root);
  const d = 0.5 * growth * v * (v + 1 - root);
  return { u, d, p: (growth - d) / (u - d) };
}
