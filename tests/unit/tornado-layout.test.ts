/**
 * The sensitivity chart on a phone: labels above their bars (`labelSpace`) give the bars the
 * chart's width, and no label overlaps a bar or the row before. In a column a third of a 320 px
 * phone's chart wide, "Sell the plant salvage (−10 % / +10 %)" was cut after four lines.
 * Figures invented.
 */
import { describe, expect, it } from 'vitest';
import { layoutTornado } from '@/lib/charts/tornado';
import type { Sensitivity } from '@/lattice';

const bump = (parameter: string, low: number, high: number): Sensitivity => ({
  parameter,
  label: parameter,
  base: 30,
  low: { input: 0.9, expandedNpv: low },
  high: { input: 1.1, expandedNpv: high },
});
const rows = [bump('underlying.value', 18, 43), bump('underlying.volatility', 27, 33), bump('option:Sell the plant:salvage', 29, 31.5)];

describe('the sensitivity chart layout', () => {
  it('with labels above, puts each label over its own bar and the bars across the width', () => {
    const layout = layoutTornado(rows, 30, 270, { labelSpace: 30, rightWidth: 24 });
    expect([layout.margin.left, layout.margin.right]).toEqual([12, 24]);
    for (const [k, r] of layout.rows.entries()) {
      // Two lines of 12 px text from labelY (the first line's middle) end above the bar.
      expect(r.labelY - 6).toBeGreaterThanOrEqual(k === 0 ? layout.margin.top : layout.rows[k - 1]!.y + layout.rows[k - 1]!.bandHeight);
      expect(r.labelY + 6 + 15).toBeLessThanOrEqual(r.y);
      expect(r.bandHeight).toBeGreaterThanOrEqual(20);
      for (const x of [r.lowX!, r.highX!]) expect(x >= 12 && x <= 270 - 24).toBe(true);
    }
    expect(layout.rows.at(-1)!.y + layout.rows.at(-1)!.bandHeight).toBeLessThanOrEqual(layout.height - layout.margin.bottom);
  });

  it('with labels above, gives each row its own label’s height: no blank line over a short label', () => {
    // Two lines for the sale's salvage, one for the others (as wrapped at 320 px).
    const lines = (s: Sensitivity) => (s.parameter.startsWith('option:') ? 2 : 1);
    const layout = layoutTornado(rows, 30, 270, { labelSpace: (s) => lines(s) * 15, rightWidth: 24 });
    for (const [k, r] of layout.rows.entries()) {
      // The label's lines (15 px each, the first centred on labelY) end where its bar begins, however many.
      expect(r.y - (r.labelY - 6 + lines(r.sensitivity) * 15)).toBe(0);
      if (k > 0) expect(r.labelY - 6).toBeGreaterThanOrEqual(layout.rows[k - 1]!.y + layout.rows[k - 1]!.bandHeight);
    }
    const uniform = layoutTornado(rows, 30, 270, { labelSpace: 30, rightWidth: 24 });
    // One row of two lines and two of one: two lines' height (30 px) less than every row at two.
    expect(uniform.height - layout.height).toBe(30);
  });

  it('beside (the desktop and the board pack), keeps the label column and centres each label on its bar', () => {
    const layout = layoutTornado(rows, 30, 800, { labelWidth: 240 });
    expect(layout.margin.left).toBe(240);
    for (const r of layout.rows) expect(r.labelY).toBeCloseTo(r.y + r.bandHeight / 2, 9);
  });
});
