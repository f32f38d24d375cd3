/**
 * Cox, Ross & Rubinstein (1979), "Option pricing: a simplified approach", J. Financial Economics
 * 7(3): u = e^{σ√Δt}, d = 1/u, p = (e^{(r−δ)Δt} − d)/(u − d). The probability matches the first
 * moment exactly, so V is an exact discounted martingale on this tree.
 */
import type { TreeInput, TreeStep } from './types';

export function crrStep({ volatility, riskFreeRate, payoutYield, dt }: TreeInput): TreeStep {
  const u = Math.exp(volatility * Math.sqrt(dt));
  const d = 1 / u;
  const growth = Math.exp((riskFreeRate - payoutYield) * dt);
  return { u, d, p: (growth - d) / (u - d) };
}
