/**
 * The deterministic part of the premium (docs/engine.md §5): what the rights add with no
 * uncertainty, computed independently here as the best date on the known path of V, and the
 * warning for a right used with probability above 95 %. Tolerance: the engine's path uses
 * σ = 1e-6 (Jarrow–Rudd, p = ½), so its nodes differ from the known path by about σ·√t: 1e-5
 * of the money covers that on these models.
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type ProjectModel } from '@/lattice';

describe('the premium split', () => {
  it('equals the best exercise date on the known path for an expansion', () => {
    // V(t) = V0·e^{(r−δ)t}; expanding by half at t pays 0.5·V(t) − K, worth e^{−rt} of that today.
    const [V0, r, delta, K, T, steps] = [100, 0.05, 0.03, 40, 5, 100];
    const model: ProjectModel = {
      underlying: { value: V0, volatility: 0.3, payoutYield: delta },
      riskFreeRate: r,
      horizon: T,
      steps,
      investment: 90,
      options: [{ kind: 'expand', factor: 0.5, cost: K, window: { kind: 'american', from: 0, to: T } }],
    };
    let best = 0;
    for (let i = 0; i <= steps; i++) {
      const t = (i * T) / steps;
      best = Math.max(best, 0.5 * V0 * Math.exp(-delta * t) - K * Math.exp(-r * t));
    }
    const result = valueProject(model);
    expect(Math.abs(result.premiumSplit!.betterPlan - best)).toBeLessThanOrEqual(1e-5 * V0);
    expect(result.premiumSplit!.betterPlan + result.premiumSplit!.uncertainty).toBeCloseTo(result.optionPremium, 10);
    // An option on a convex payoff is worth more with uncertainty than without.
    expect(result.premiumSplit!.uncertainty).toBeGreaterThan(0);
  });

  it('is zero for a right that is never worth using on the known path', () => {
    const result = valueProject({
      underlying: { value: 100, volatility: 0.3 },
      riskFreeRate: 0.03,
      horizon: 3,
      steps: 60,
      investment: 80,
      options: [{ kind: 'abandon', salvage: 50, window: { kind: 'american', from: 0, to: 3 } }],
    });
    expect(Math.abs(result.premiumSplit!.betterPlan)).toBeLessThanOrEqual(1e-9 * 100);
    expect(result.premiumSplit!.uncertainty).toBeGreaterThan(0);
  });

  it('warns when a right is used later with probability above 95 %, and not for a decision taken today', () => {
    // Selling for 120 at year 3 a project that pays out 90 % of its value by then: almost sure.
    const sure = valueProject({
      underlying: { value: 100, volatility: 0.2, payoutPeriods: [{ from: 0, to: 3, fraction: 0.9 }] },
      riskFreeRate: 0.03,
      horizon: 3,
      steps: 60,
      investment: 80,
      options: [{ kind: 'abandon', id: 'Sale', salvage: 120, fixedSalvage: true, window: { kind: 'european', at: 3 } }],
    });
    expect(sure.rights[0]!.exerciseProbability).toBeGreaterThan(0.95);
    expect(sure.warnings.some((w) => w.startsWith('Sale is used with probability'))).toBe(true);
    // Building for 50 a project worth 100 that leaks 15 % a year: build now.
    const today = valueProject({
      underlying: { value: 100, volatility: 0.2, payoutYield: 0.15 },
      riskFreeRate: 0.03,
      horizon: 3,
      steps: 60,
      options: [{ kind: 'defer', id: 'Build', cost: 50, window: { kind: 'american', from: 0, to: 3 } }],
    });
    expect(today.rights[0]!.exerciseTiming[0]).toEqual({ t: 0, probability: 1 });
    expect(today.warnings.some((w) => w.startsWith('Build is used with probability'))).toBe(false);
  });
});
