/**
 * The submit dialog names what a committee would read as missing or doubtful
 * (lib/submission-gaps.ts): a volatility with no stated source, which the board pack prints as
 * "Not stated", or entered directly with no justification; and the engine's warnings. The demo
 * cases (invented figures) each state their volatility's source.
 */
import { describe, expect, it } from 'vitest';
import { demoPortfolio } from '@/demo/portfolio';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { starterCase } from '@/lib/starter-case';
import { submissionGaps } from '@/lib/submission-gaps';
import { volatilitySourceText } from '@/lib/volatility/method-words';
import { warningSentence } from '@/lib/warning-words';

describe('what a submission would leave the committee without', () => {
  it('is the volatility’s source on a new case, in the words the board pack would print', () => {
    const fresh = starterCase('New', { wacc: 0.085, riskFreeRate: 0.03 });
    const gaps = submissionGaps(fresh);
    expect(gaps).toHaveLength(1);
    expect(gaps[0]).toContain('The volatility (30.0 %)');
    expect(gaps[0]).toContain(`“${volatilitySourceText(fresh.settings.volatilitySource)}”`);
  });

  it('is a justification left empty, and nothing once one is written', () => {
    const fresh = starterCase('New', { wacc: 0.085, riskFreeRate: 0.03 });
    const bare = { settings: { ...fresh.settings, volatilitySource: { method: 'direct' as const, note: '  ' } } };
    expect(submissionGaps(bare)[0]).toContain(`“${volatilitySourceText({ method: 'direct', note: '' })}”`);
    expect(submissionGaps({ settings: { ...bare.settings, volatilitySource: { method: 'direct', note: 'Peers’ unlevered value, five years.' } } })).toEqual([]);
  });

  it('is each engine warning, as the board pack prints it', () => {
    const plant = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
    const { warnings } = valueProject(caseToModel(plant).model);
    // The plant at its 96 steps warns of its error band (see the same-words-everywhere test).
    expect(warnings.length).toBeGreaterThan(0);
    expect(submissionGaps(plant, warnings)).toEqual(warnings.map((w) => `The board pack prints the engine’s warning: ${warningSentence(w)}`));
  });

  it('is no volatility gap for any demo case', () => {
    for (const project of demoPortfolio)
      for (const c of project.cases)
        expect({ case: `${project.name} / ${c.name}`, gaps: submissionGaps(c) }).toEqual({ case: `${project.name} / ${c.name}`, gaps: [] });
  });
});
