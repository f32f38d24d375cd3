/**
 * Geometry of the "NPV with and without flexibility" chart: one row per item, a hollow mark at
 * the static NPV and a filled mark at the expanded NPV joined by a bar (the option premium),
 * and a zero line. Pure (d3-scale only), so the web chart and the PDF chart draw the same thing.
 *
 * Labels sit left of their row, with the figures right of the marks; on a narrow screen
 * (`labelsAbove`) each row's label and figures go on a line above its marks instead, so the
 * names are not cut to a few letters and the scale gets the whole width (on a 375 px phone the
 * chart was 320 px wide, and a label column and a figures margin left the marks 88 px of it).
 * When a name and its figures do not both fit on that line (`figuresOwnLine`; the demo's
 * "Phased bio-resin plant" on a 320 or 360 px phone), the figures take a line of their own
 * under the name, so the name is not cut either.
 */
import { scaleBand, scaleLinear } from 'd3';
import { formatMoney } from '../format';
import { axisTicks } from './axis';
import { fitsWhole, textWidth } from './wrap-label';

export interface NpvPair {
  id: string;
  label: string;
  staticNpv: number;
  expandedNpv: number;
}

export interface NpvComparisonLayout {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
  x: (value: number) => number;
  ticks: { value: number; x: number; label: string }[];
  zeroX: number;
  /**
   * Per row: `y` is the marks' line, `labelY` the label's and `figuresY` the figures' (all one
   * line unless labels sit above; the label's line unless the figures have their own).
   */
  rows: (NpvPair & { y: number; labelY: number; figuresY: number; staticX: number; expandedX: number })[];
  rowHeight: number;
  labelsAbove: boolean;
}

export function layoutNpvComparison(
  items: NpvPair[],
  width: number,
  options: { rowHeight?: number; labelWidth?: number; tickCharWidth?: number; labelsAbove?: boolean; figuresOwnLine?: boolean } = {},
): NpvComparisonLayout {
  const labelsAbove = options.labelsAbove ?? false;
  const figuresOwnLine = labelsAbove && (options.figuresOwnLine ?? false);
  const rowHeight = options.rowHeight ?? (figuresOwnLine ? 76 : labelsAbove ? 56 : 44);
  // Above: room for a mark's radius (7 px) and a little on each side.
  const margin = labelsAbove ? { top: 12, right: 12, bottom: 32, left: 12 } : { top: 12, right: 130, bottom: 32, left: options.labelWidth ?? 200 };
  const height = margin.top + margin.bottom + rowHeight * Math.max(items.length, 1);
  const values = items.flatMap((i) => [i.staticNpv, i.expandedNpv, 0]);
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const pad = (hi - lo || 1) * 0.08;
  const x = scaleLinear()
    .domain([lo - pad, hi + pad])
    .nice()
    .range([margin.left, width - margin.right]);
  const y = scaleBand()
    .domain(items.map((i) => i.id))
    .range([margin.top, height - margin.bottom])
    .padding(0.35);
  return {
    width,
    height,
    margin,
    x,
    ticks: axisTicks(x, 6, { charWidth: options.tickCharWidth }).map((t) => ({ value: t.value, x: t.at, label: t.label })),
    zeroX: x(0),
    rowHeight,
    labelsAbove,
    rows: items.map((i) => {
      const middle = (y(i.id) ?? 0) + y.bandwidth() / 2;
      // Above: the label's line and the marks' line share the row, 24 px apart; with the figures
      // on their own line, label, figures and marks 18 and 20 px apart.
      const [labelY, figuresY, marksY] = figuresOwnLine
        ? [middle - 22, middle - 4, middle + 16]
        : labelsAbove
          ? [middle - 12, middle - 12, middle + 12]
          : [middle, middle, middle];
      return { ...i, y: marksY, labelY, figuresY, staticX: x(i.staticNpv), expandedX: x(i.expandedNpv) };
    }),
  };
}

/** A row's figures as the chart prints them: static → expanded. */
export const npvFigures = (r: NpvPair) => `${formatMoney(r.staticNpv)} → ${formatMoney(r.expandedNpv)}`;

/**
 * Where a screen chart of `width` px puts its names (15 px text; figures 12 px): left of the rows
 * in a column, wrapped to two lines; below 480 px (a phone), or when a name would not fit those
 * two lines whole, above the rows across the chart (comparing two cases beside the case list, a
 * 625 px chart read "Volatile demand (Phased bio-resin…"). Above, a name that does not fit beside
 * its figures on the line (the chart's width less 24 px of margins) gets the line to itself.
 */
export function npvLabelPlacement(items: NpvPair[], width: number): { labelWidth: number; labelsAbove: boolean; figuresOwnLine: boolean; line: number } {
  const labelWidth = Math.min(260, width * 0.32);
  const labelsAbove = width < 480 || items.some((r) => !fitsWhole(r.label, labelWidth - 16, 15, 2));
  const line = width - 24;
  const figuresOwnLine = labelsAbove && items.some((r) => !fitsWhole(r.label, line - textWidth(npvFigures(r), 12) - 12, 15, 1));
  return { labelWidth, labelsAbove, figuresOwnLine, line };
}
