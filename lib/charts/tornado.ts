/**
 * Geometry of the tornado: for each input, the expanded NPV when it is moved down and up,
 * drawn as bars from the base value, widest swing on top. Pure, shared by web and PDF charts.
 *
 * Labels sit in a column left of the bars; on a narrow screen (`labelSpace`, the height of the
 * label's lines) each label goes above its bar instead, across the chart's width: in a third
 * of a 320 px phone's chart, "Sell the plant salvage (−10 % / +10 %)" did not fit four lines.
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
  options: { labelWidth?: number; rightWidth?: number; rowHeight?: number; tickCharWidth?: number; labelSpace?: number } = {},
): TornadoLayout {
  const usable = sensitivities.filter((s) => s.low.expandedNpv !== null || s.high.expandedNpv !== null);
  const swing = (s: Sensitivity) => Math.abs((s.high.expandedNpv ?? base) - (s.low.expandedNpv ?? base));
  const sorted = [...usable].sort((a, b) => swing(b) - swing(a));
  const above = options.labelSpace ?? 0;
  const rowHeight = (options.rowHeight ?? 34) + above;
  const margin = { top: 8, right: options.rightWidth ?? 64, bottom: 28, left: above > 0 ? 12 : (options.labelWidth ?? 220) };
  const height = margin.top + margin.bottom + rowHeight * Math.max(sorted.length, 1);
  const values = sorted.flatMap((s) => [s.low.expandedNpv ?? base, s.high.expandedNpv ?? base]).concat(base);
  const x = scaleLinear()
    .domain([Math.min(...values), Math.max(...values)])
    .nice()
    .range([margin.left, width - margin.right]);
  const y = scaleBand()
    .domain(sorted.map((s) => s.parameter))
    .range([margin.top, height - margin.bottom])
    // Above, 10 px between rows: the row's own padding would take a quarter of its label's room from the bar.
    .padding(above > 0 ? 10 / rowHeight : 0.25);
  return {
    width,
    height,
    margin,
    baseX: x(base),
    ticks: axisTicks(x, 5, { charWidth: options.tickCharWidth }).map((t) => ({ value: t.value, x: t.at, label: t.label })),
    rows: sorted.map((s) => {
      const top = y(s.parameter) ?? 0;
      // Above: the label's lines from the top of the row's band, the bar in the rest of it.
      const bandHeight = y.bandwidth() - above;
      return {
        sensitivity: s,
        y: top + above,
        bandHeight,
        labelY: above > 0 ? top + 6 : top + bandHeight / 2,
        lowX: s.low.expandedNpv === null ? null : x(s.low.expandedNpv),
        highX: s.high.expandedNpv === null ? null : x(s.high.expandedNpv),
        swing: swing(s),
      };
    }),
  };
}
