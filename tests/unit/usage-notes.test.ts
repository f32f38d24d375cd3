/**
 * The option cards' notes on a right used almost surely or never (lib/usage-notes.ts) say what
 * the engine's warnings say, on the card they are about, and on no other. The schedule is the one an
 * analyst typed into a new case in a browser session (invented figures): capex 120 today,
 * revenue 45 to 65 over five years against costs of 18.5.
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type OptionTemplate } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { usageNotes } from '@/lib/usage-notes';
import type { CaseInput } from '@/lib/validations/case';

const rows = [0, 1, 2, 3, 4, 5].map((year) => ({
  year,
  revenue: year === 0 ? 0 : 40 + 5 * year,
  operatingCost: year === 0 ? 0 : 18.5,
  capex: year === 0 ? 120 : 0,
  tax: 0,
  workingCapital: 0,
}));

const caseWith = (options: OptionTemplate[]): CaseInput => ({
  name: 'Typed in a session',
  cashFlows: { rows, wacc: 0.085, timing: 'end-of-year' },
  settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 100, tree: 'crr', volatilitySource: { method: 'direct', note: 'Invented for a test.' } },
  options,
});

// Selling for 70 once the last year has paid out is a certain gain: the project is then worth
// nothing. An expansion costing more than the project could ever add at 30 % is a real choice.
const sureSale: OptionTemplate = { kind: 'abandon', salvage: 70, window: { kind: 'american', from: 0, to: 5 } };
const realExpansion: OptionTemplate = { kind: 'expand', id: 'Phase 2', factor: 0.3, cost: 60, window: { kind: 'american', from: 1, to: 4 } };

const valued = (options: OptionTemplate[]) => valueProject(caseToModel(caseWith(options)).model);
const warned = (warnings: string[], id: string) => warnings.find((w) => w.startsWith(`${id} is used with probability`));

describe('the note on a card whose right is used almost surely', () => {
  it('is on the sale that is a certain gain, with the engine’s own probability, and not on the real option', () => {
    const options = [realExpansion, sureSale];
    const result = valued(options);
    const notes = usageNotes(options, result.rights);
    // The engine warns of the unnamed sale (abandon-1) and not of the expansion; the cards agree.
    const sale = warned(result.warnings, 'abandon-1');
    expect(sale).toBeDefined();
    expect(warned(result.warnings, 'Phase 2')).toBeUndefined();
    expect(Object.keys(notes)).toEqual(['1']);
    // The same probability, as the warning prints it (one decimal).
    const probability = sale!.match(/probability (\d+\.\d) %/)![1];
    expect(notes[1]).toContain(`used in ${probability} % of outcomes`);
  });

  it('is on a pause that saves nothing: never used, as the engine warns', () => {
    // Mothballing stops the cash and pays 2 to pause and 4 to restart, earning nothing meanwhile.
    const pause: OptionTemplate = {
      kind: 'mothball',
      id: 'Pause',
      toScale: 0,
      cost: 2,
      backCost: 4,
      flowPerYear: 0,
      window: { kind: 'american', from: 0, to: 4 },
    };
    const options = [realExpansion, pause];
    const result = valued(options);
    expect(result.warnings.some((w) => w.startsWith('Pause is never exercised'))).toBe(true);
    expect(usageNotes(options, result.rights)).toEqual({ 1: expect.stringMatching(/^At these terms it is never used on this lattice/) });
  });

  it('is on no card when the result is of another set of cards', () => {
    // The sale's result read against cards where that place holds an expansion: nothing noted.
    const result = valued([realExpansion, sureSale]);
    expect(usageNotes([realExpansion, { ...realExpansion, id: 'Phase 3' }], result.rights)).toEqual({});
    // And a right's note follows it to its new place once valued there.
    const moved = [sureSale, realExpansion];
    expect(Object.keys(usageNotes(moved, valued(moved).rights))).toEqual(['0']);
  });
});
