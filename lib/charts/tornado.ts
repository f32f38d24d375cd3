/**
 * Geometry of the tornado: for each input, the expanded NPV when it is moved down and up,
 * drawn as bars from the base value, widest swing on top. Pure, shared by web and PDF charts.
 *
 * Labels sit in a column left of the bars; on a narrow screen (`labelSpace`, the height of the
 * label's lines, one for all rows or each row's own) each label goes above its bar instead,
 * across the chart's width: in a third of a 320 px phone's chart, "Sell the plant salvage
 * (−10 % / +10 %)" did not fit four lines. Each row then takes its own label's height: given the
 * longest label's, a one-line label sat a blank line above its bar.
 */
import { scaleBand, scaleLinear } from 'd3';
import { axisTicks } from './axis';
import type { Sensitivity } from '@/lattice';

export interface TornadoLayout {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
  baseX: number;
  ticks: { value: number; x: number; label: string }[];
  /** Per row: the bar's top `y` and height; `labelY` the middle of the label's first line above the bar, or of the whole label beside it. */
  rows: { sensitivity: Sensitivity; y: number; bandHeight: number; labelY: number; lowX: number | null; highX: number | null; swing: number }[];
}

export function layoutTornado(
  sensitivities: Sensitivity[],
  base: number,
  width: number,
  options: {
    labelWidth?: number;
    rightWidth?: number;
    rowHeight?: number;
    tickCharWidth?: number;
    labelSpace?: number | ((s: Sensitivity) => number);
  } = {},
): TornadoLayout {
  const usable = sensitivities.filter((s) => s.low.expandedNpv !== null || s.high.expandedNpv !== null);
  const swing = (s: Sensitivity) => Math.abs((s.high.expandedNpv ?? base) - (s.low.expandedNpv ?? base));
  const sorted = [...usable].sort((a, b) => swing(b) - swing(a));
  const space = options.labelSpace;
  const spaceOf = typeof space === 'function' ? space : () => space ?? 0;
  const above = sorted.some((s) => spaceOf(s) > 0);
  const barRow = options.rowHeight ?? 34;
  const margin = { top: 8, right: options.rightWidth ?? 64, bottom: 28, left: above ? 12 : (options.labelWidth ?? 220) };
  const values = sorted.flatMap((s) => [s.low.expandedNpv ?? base, s.high.expandedNpv ?? base]).concat(base);
  const x = scaleLinear()
    .domain([Math.min(...values), Math.max(...values)])
    .nice()
    .range([margin.left, width - margin.right]);
  const bars = (s: Sensitivity) => ({
    sensitivity: s,
    lowX: s.low.expandedNpv === null ? null : x(s.low.expandedNpv),
    highX: s.high.expandedNpv === null ? null : x(s.high.expandedNpv),
    swing: swing(s),
  });
  const ticks = () => axisTicks(x, 5, { charWidth: options.tickCharWidth }).map((t) => ({ value: t.value, x: t.at, label: t.label }));

  if (above) {
    // Each row: its label's lines, the bar, then 10 px to the next row (a band's own padding
    // would take a quarter of the label's room from the bar); 10 px before the first row.
    const gap = 10;
    let top = margin.top + gap;
    const rows = sorted.map((s) => {
      const row = { ...bars(s), y: top + spaceOf(s), bandHeight: barRow - gap, labelY: top + 6 };
      top += barRow + spaceOf(s);
      return row;
    });
    return { width, height: top + margin.bottom, margin, baseX: x(base), ticks: ticks(), rows };
  }
  const height = margin.top + margin.bottom + barRow * Math.max(sorted.length, 1);
  const y = scaleBand()
    .domain(sorted.map((s) => s.parameter))
    .range([margin.top, height - margin.bottom])
    .padding(0.25);
  return {
    width,
    height,
    margin,
    baseX: x(base),
    ticks: ticks(),
    rows: sorted.map((s) => {
      const top = y(s.parameter) ?? 0;
      return { ...bars(s), y: top, bandHeight: y.bandwidth(), labelY: top + y.bandwidth() / 2 };
    }),
  };
}
