/**
 * The words under the results and in the validation report for dates the lattice moved
 * (lib/snap-words.ts), from a real valuation: eight years in 100 steps put years 1 and 7 halfway
 * between steps, and the window keeps the steps inside it (docs/engine.md §2).
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type ProjectModel } from '@/lattice';
import { describeSnaps } from '@/lib/snap-words';

const sale = (steps: number): ProjectModel => ({
  underlying: { value: 100, volatility: 0.3 },
  riskFreeRate: 0.04,
  horizon: 8,
  steps,
  options: [{ kind: 'abandon', salvage: 90, window: { kind: 'american', from: 1, to: 7 } }],
});

describe('describeSnaps', () => {
  it('names each moved date with where it went, and says how windows move', () => {
    const words = describeSnaps(valueProject(sale(100), { extras: false }).snaps);
    expect(words).toContain('a window to the steps inside it');
    expect(words).toContain('options[0].window.from from 1.000 to 1.040');
    expect(words).toContain('options[0].window.to from 7.000 to 6.960');
  });

  it('says nothing when every date is on a step', () => {
    expect(describeSnaps(valueProject(sale(96), { extras: false }).snaps)).toBeNull();
  });
});
