/**
 * Models and results stored by older engines read in today's shape (lattice/stored-model.ts,
 * lattice/stored-result.ts): a 3.x model, whose rights named their kind under `type` and called
 * the right to pause and restart `switch`, values to exactly the figures of the same model
 * written today; the engine's input itself takes today's shape only, and says which field is wrong.
 */
import { describe, expect, it } from 'vitest';
import { ModelError, readStoredModel, readStoredResult, readStoredTemplates, templateIds, valueProject, type ProjectModel } from '@/lattice';

const window = { kind: 'american', from: 0, to: 4 } as const;
const today: ProjectModel = {
  underlying: { value: 100, volatility: 0.3 },
  riskFreeRate: 0.04,
  horizon: 4,
  steps: 40,
  options: [
    { kind: 'expand', id: 'Phase 2', factor: 0.5, cost: 35, window },
    { kind: 'mothball', id: 'Pause', toScale: 0, cost: 1, backCost: 3, flowPerYear: 2, window },
    { kind: 'abandon', id: 'Sell', salvage: 60, window },
  ],
};
const written3x = {
  ...today,
  options: [
    { type: 'expand', id: 'Phase 2', factor: 0.5, cost: 35, window },
    { type: 'switch', id: 'Pause', toScale: 0, cost: 1, backCost: 3, flowPerYear: 2, window },
    { type: 'abandon', id: 'Sell', salvage: 60, window },
  ],
};

describe('stored shapes', () => {
  it('read a 3.x model as today’s, which values to the same figures', () => {
    const read = readStoredModel(written3x);
    expect(read).toEqual(today);
    expect(valueProject(read)).toEqual(valueProject(today));
    // Reading today's shape changes nothing.
    expect(readStoredModel(today)).toEqual(today);
  });

  it('keep the id an unnamed 3.x switch was stored and decided under (switch-n, not mothball-n)', () => {
    const pause = { toScale: 0, cost: 1, backCost: 3, window };
    const read = readStoredTemplates([
      { type: 'switch', ...pause },
      { type: 'abandon', salvage: 60, window },
      { type: 'switch', ...pause, id: 'Idle' },
      { type: 'switch', ...pause },
    ]);
    expect(templateIds(read)).toEqual(['switch-1', 'abandon-1', 'Idle', 'switch-3']);
    expect(read.map((o) => o.kind)).toEqual(['mothball', 'abandon', 'mothball', 'mothball']);
    // A right written today without a name takes its id from its kind.
    expect(templateIds([{ kind: 'mothball', ...pause }])).toEqual(['mothball-1']);
  });

  it('read a 3.x result’s pause-and-restart right as mothball, and a 2.x result’s rights under rights', () => {
    const result = valueProject(today, { extras: false });
    const kinds = result.rights.map((r) => r.kind);
    expect(kinds).toEqual(['expand', 'mothball', 'abandon']);
    const stored3x = { ...result, rights: result.rights.map((r) => (r.kind === 'mothball' ? { ...r, kind: 'switch' } : r)) };
    expect(readStoredResult(stored3x)).toEqual(result);
    const { rights, ...rest } = stored3x;
    expect(readStoredResult({ ...rest, switches: rights })).toEqual(result);
  });

  it('refuse the old shape as the engine’s input, naming the field', () => {
    let caught: unknown;
    try {
      valueProject(written3x as unknown as ProjectModel);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(ModelError);
    expect((caught as ModelError).message).toContain(
      'options[0].kind must be one of "expand", "contract", "abandon", "defer", "stage", "mothball", got nothing',
    );
  });
});
