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
  options: [{ kind: 'abandon', id: 'Sell the plant', salvage: 90, window: { kind: 'american', from: 1, to: 7 } }],
});

describe('describeSnaps', () => {
  it('names each moved date by its right and says where it went, and how windows move', () => {
    const r = valueProject(sale(100), { extras: false });
    const words = describeSnaps(
      r.snaps,
      r.rights.map((x) => x.id),
    );
    expect(words).toContain('a window to the steps inside it');
    expect(words).toContain('“Sell the plant” window opens: year 1.000 → 1.040');
    expect(words).toContain('“Sell the plant” window closes: year 7.000 → 6.960');
  });

  it('names Bermudan dates, stage payments and payouts by their place', () => {
    const snap = (field: string) => describeSnaps([{ field, requested: 1, used: 1.04 }], ['Build', 'Stages']);
    expect(snap('options[0].window.dates[2]')).toContain('“Build” date 3: year 1.000 → 1.040');
    expect(snap('options[1].payments[0].window.at')).toContain('“Stages” payment 1:');
    expect(snap('underlying.payouts[4].at')).toContain('payout 5:');
    expect(snap('switches[0].window.from')).toContain('switches[0].window.from:');
  });

  it('says nothing when every date is on a step', () => {
    expect(describeSnaps(valueProject(sale(96), { extras: false }).snaps, [])).toBeNull();
  });
});
