/**
 * Jarrow & Rudd (1983), *Option Pricing*: equal probabilities p = ½ and
 * u, d = e^{(r−δ−σ²/2)Δt ± σ√Δt}. The first moment is matched only to O(Δt²) per step.
 */
import type { TreeInput, TreeStep } from './types';

export function jarrowRuddStep({ volatility, riskFreeRate, payoutYield, dt }: TreeInput): TreeStep {
  const drift = (riskFreeRate - payoutYield - (volatility * volatility) / 2) * dt;
  const move = volatility * Math.sqrt(dt);
  return { u: Math.exp(drift + move), d: Math.exp(drift - move), p: 0.5 };
}
