/**
 * The NPV comparison chart on a phone: with labels above their rows, the marks get the width a
 * label column and a figures margin used to take (on a 375 px phone the chart was 320 px wide,
 * the marks had 88 px of it and the demo's names were cut to "Cold-stor… hub"), and every mark
 * stays inside the drawing. Figures invented.
 */
import { describe, expect, it } from 'vitest';
import { layoutNpvComparison, npvFigures, npvLabelPlacement, type NpvPair } from '@/lib/charts/npv-comparison';
import { textWidth, wrapLabel } from '@/lib/charts/wrap-label';
import { SCREEN_LABEL_CHAR } from '@/lib/charts/axis';

const items: NpvPair[] = [
  { id: 'a', label: 'Cold-storage hub', staticNpv: -6, expandedNpv: 6 },
  { id: 'b', label: 'Older extrusion line', staticNpv: 15.4, expandedNpv: 18.9 },
  { id: 'c', label: 'Phased bio-resin plant', staticNpv: -11, expandedNpv: 20.1 },
];

describe('the NPV comparison layout', () => {
  it('a 375 px wide chart with labels above gives the marks all but 24 px of the width, each row its label line above its marks', () => {
    const layout = layoutNpvComparison(items, 375, { tickCharWidth: SCREEN_LABEL_CHAR, labelsAbove: true });
    expect([layout.margin.left, layout.margin.right]).toEqual([12, 12]);
    // The scale runs from margin to margin: the lowest and highest ticks lie inside it.
    expect(layout.ticks[0]!.x).toBeGreaterThanOrEqual(12);
    expect(layout.ticks.at(-1)!.x).toBeLessThanOrEqual(375 - 12);
    for (const r of layout.rows) {
      for (const x of [r.staticX, r.expandedX]) expect(x >= 12 && x <= 375 - 12).toBe(true);
      // The label's line is above the marks' line and inside the drawing.
      expect(r.labelY).toBeLessThan(r.y - 16);
      expect(r.labelY).toBeGreaterThan(8);
      expect(r.y).toBeLessThan(layout.height - layout.margin.bottom);
    }
    // Rows do not overlap: each label line is below the previous row's marks.
    for (let k = 1; k < layout.rows.length; k++) expect(layout.rows[k]!.labelY).toBeGreaterThan(layout.rows[k - 1]!.y + 12);
  });

  it('with the figures on their own line, puts name, figures and marks in that order, rows apart', () => {
    // On a 320 px phone the chart is 270 px wide, and "Phased bio-resin plant" beside its
    // figures was cut to "Phased bio-resi…".
    const layout = layoutNpvComparison(items, 270, { tickCharWidth: SCREEN_LABEL_CHAR, labelsAbove: true, figuresOwnLine: true });
    for (const r of layout.rows) {
      // Lines of 15 px and 12 px text, at least 16 px apart; the label's line inside the drawing.
      expect(r.figuresY - r.labelY).toBeGreaterThanOrEqual(16);
      expect(r.y - r.figuresY).toBeGreaterThanOrEqual(16);
      expect(r.labelY).toBeGreaterThan(8);
      expect(r.y + 7).toBeLessThan(layout.height - layout.margin.bottom);
    }
    for (let k = 1; k < layout.rows.length; k++) expect(layout.rows[k]!.labelY).toBeGreaterThan(layout.rows[k - 1]!.y + 16);
  });

  it('wider, keeps labels beside their rows on the same line (the board pack and the desktop)', () => {
    const layout = layoutNpvComparison(items, 900, { labelWidth: 260 });
    expect(layout.labelsAbove).toBe(false);
    for (const r of layout.rows) expect([r.labelY, r.figuresY]).toEqual([r.y, r.y]);
    expect([layout.margin.left, layout.margin.right]).toEqual([260, 130]);
  });

  it('puts the names above their rows, whole, when one would not fit two lines of the column', () => {
    // Two cases compared beside the case list at 1280 px: a 625 px chart (its 665 px panel less
    // padding), a 200 px label column, and "Volatile demand (Phased bio-resin…" in it.
    const cases: NpvPair[] = [
      { id: 'a', label: 'Base case (Phased bio-resin plant)', staticNpv: -11, expandedNpv: 20.1 },
      { id: 'b', label: 'Volatile demand (Phased bio-resin plant)', staticNpv: -11, expandedNpv: 32.6 },
    ];
    const placed = npvLabelPlacement(cases, 625);
    expect(wrapLabel(cases[1]!.label, placed.labelWidth - 16, 15, 2).join(' ')).toContain('…');
    expect(placed).toMatchObject({ labelsAbove: true, figuresOwnLine: false });
    // Above, each name fits whole on its line beside its figures, as the chart draws it.
    for (const r of cases) expect(wrapLabel(r.label, placed.line - textWidth(npvFigures(r), 12) - 12, 15, 1)).toEqual([r.label]);
    // The portfolio's project names fit the column at the same width: they stay beside their rows.
    expect(npvLabelPlacement(items, 625).labelsAbove).toBe(false);
    // A phone puts them above whatever their length.
    expect(npvLabelPlacement(items, 400).labelsAbove).toBe(true);
  });
});
