/**
 * The demo's cases say where their own volatility comes from. The "Volatile demand" and "Calmer
 * market" cases changed the figure (42 % and 20 %) but kept their base case's justification,
 * which names the source of 30 % and 28 %: a reviewer reading the case would find the two at odds.
 */
import { describe, expect, it } from 'vitest';
import { demoPortfolio } from '@/demo/portfolio';

describe('the demo cases', () => {
  const cases = demoPortfolio.flatMap((p) => p.cases.map((c) => ({ project: p.name, ...c })));

  it('each state a volatility source labelled as invented', () => {
    for (const c of cases) expect(c.settings.volatilitySource?.note, `${c.project}: ${c.name}`).toMatch(/^Invented for the demo/);
  });

  it('give a different volatility its own justification', () => {
    for (const a of cases)
      for (const b of cases)
        if (a.settings.volatility !== b.settings.volatility)
          expect(a.settings.volatilitySource!.note, `${a.project}: ${a.name} and ${b.name}`).not.toBe(b.settings.volatilitySource!.note);
  });
});
