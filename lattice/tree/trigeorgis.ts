/**
 * Trigeorgis (1991), "A log-transformed binomial numerical analysis method for valuing complex
 * multi-option investments", J. Financial and Quantitative Analysis 26(3): in x = ln V, with
 * ν = r − δ − σ²/2, Δx = √(σ²Δt + ν²Δt²), u = e^{Δx}, d = e^{−Δx}, p = ½ + ½·νΔt/Δx.
 */
import type { TreeInput, TreeStep } from './types';

export function trigeorgisStep({ volatility, riskFreeRate, payoutYield, dt }: TreeInput): TreeStep {
  const drift = (riskFreeRate - payoutYield - (volatility * volatility) / 2) * dt;
  const dx = Math.sqrt(volatility * volatility * dt + drift * drift);
  return { u: Math.exp(dx), d: Math.exp(-dx), p: 0.5 + (0.5 * drift) / dx };
}
