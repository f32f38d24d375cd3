/**
 * Rights already used before the valuation date (`exercised`, docs/engine.md §10): the tree
 * starts in the mode they made. Checked by hand on the small CRR tree of
 * interactions-by-hand.test.ts (σ = ln 1.25, Δt = 1, e^{rΔt} = 1.05: u = 1.25, d = 0.8, p = 5/9;
 * nodes 125, 80 at t = 1 and 156.25, 100, 64 at t = 2), and against models that state the same
 * position another way (raw modes with a start mode; a project with no right to invest), which
 * reach the numbers through other code (common practice, no source). Tolerance 1e-9: exact
 * fractions and the same tree.
 */
import { describe, expect, it } from 'vitest';
import { ModelError, valueProject, type OptionTemplate, type ProjectModel } from '@/lattice';
import { expectClose } from './support/check';

const base = {
  underlying: { value: 100, volatility: Math.log(1.25) },
  riskFreeRate: Math.log(1.05),
  tree: 'crr' as const,
  horizon: 2,
  steps: 2,
};
const p = 5 / 9;
const q = 4 / 9;
const whole = { kind: 'american', from: 0, to: 2 } as const;

describe('rights used before the valuation date', () => {
  it('an expansion already made: the tree starts expanded, and the salvage follows the larger plant', () => {
    // Expanded by 50 %, salvage 70 at base scale → 105 for the expanded plant.
    // t = 2: max(1.5V, 105) → 234.375, 150, 105.
    // t = 1: at 125 (5/9·234.375 + 4/9·150)/1.05 = 187.5; at 80 (5/9·150 + 4/9·105)/1.05 = 123.809524 > 105.
    // t = 0: (5/9·187.5 + 4/9·123.809524)/1.05 = 151.612497; the expansion's cost is not paid again.
    const options: OptionTemplate[] = [
      { kind: 'expand', id: 'phase-2', factor: 0.5, cost: 30, window: whole },
      { kind: 'abandon', id: 'sell', salvage: 70, window: whole },
    ];
    const r = valueProject({ ...base, options, exercised: ['phase-2'] }, { extras: false });
    const up = (p * 234.375 + q * 150) / 1.05;
    const down = (p * 150 + q * 105) / 1.05;
    expectClose(down, 123.809524, { abs: 1e-6 }, { step: 'hand arithmetic' });
    expectClose(r.value, (p * up + q * down) / 1.05, { abs: 1e-9 }, { case: 'expanded before' });
    expect(r.startMode).toBe('operating+phase-2');
    // The expansion cannot be used twice.
    expect(r.rights[0]!.exerciseProbability).toBe(0);
  });

  it('a plant mothballed before the valuation date equals raw modes that start mothballed', () => {
    const window = whole;
    const templates: ProjectModel = {
      ...base,
      options: [{ kind: 'mothball', id: 'mothball', toScale: 0, flowPerYear: -4, cost: 5, backCost: 12, window }],
      exercised: ['mothball'],
    };
    const raw: ProjectModel = {
      ...base,
      modes: [
        { id: 'operating', scale: 1 },
        { id: 'mothballed', scale: 0, flowPerYear: -4 },
      ],
      start: 'mothballed',
      switches: [
        { id: 'mothball', from: ['operating'], to: 'mothballed', cost: 5, window },
        { id: 'restart', from: ['mothballed'], to: 'operating', cost: 12, window },
      ],
    };
    const a = valueProject(templates, { extras: false });
    const b = valueProject(raw, { extras: false });
    expectClose(a.value, b.value, { abs: 1e-9 }, { case: 'mothballed start' });
    expect(a.startMode).toBe('operating (mothball)');
  });

  it('an investment already made (defer used) equals the project with no right to invest', () => {
    const sell: OptionTemplate = { kind: 'abandon', id: 'sell', salvage: 70, window: whole };
    const a = valueProject(
      { ...base, options: [{ kind: 'defer', id: 'build', cost: 90, window: { kind: 'american', from: 0, to: 1 } }, sell], exercised: ['build'] },
      { extras: false },
    );
    const b = valueProject({ ...base, options: [sell] }, { extras: false });
    expectClose(a.value, b.value, { abs: 1e-9 }, { case: 'invested before' });
  });

  it('a project abandoned before the valuation date is worth nothing', () => {
    const r = valueProject({ ...base, options: [{ kind: 'abandon', id: 'sell', salvage: 70, window: whole }], exercised: ['sell'] }, { extras: false });
    expect(r.value).toBe(0);
  });

  it('refuses names that are not templates, stage options, use after abandonment and use without options', () => {
    const field = (model: ProjectModel) => {
      try {
        valueProject(model, { extras: false });
      } catch (error) {
        if (error instanceof ModelError) return error.issues[0]!.field;
        throw error;
      }
      return 'accepted';
    };
    const sell: OptionTemplate = { kind: 'abandon', id: 'sell', salvage: 70, window: whole };
    const grow: OptionTemplate = { kind: 'expand', id: 'grow', factor: 0.5, cost: 30, window: whole };
    expect(field({ ...base, options: [sell], exercised: ['nothing'] })).toBe('exercised[0]');
    expect(field({ ...base, options: [{ kind: 'stage', id: 'st', payments: [{ at: 1, amount: 10 }] }], exercised: ['st'] })).toBe('exercised[0]');
    expect(field({ ...base, options: [sell, grow], exercised: ['sell', 'grow'] })).toBe('exercised[1]');
    expect(field({ ...base, exercised: ['sell'] })).toBe('exercised');
    expect(field({ ...base, options: [{ kind: 'defer', id: 'build', cost: 90, window: whole }, grow], exercised: ['grow'] })).toBe('exercised[0]');
  });
});
