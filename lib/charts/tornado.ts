/**
 * Geometry of the tornado: for each input, the expanded NPV when it is moved down and up,
 * drawn as bars from the base value, widest swing on top. Pure, shared by web and PDF charts.
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
  rows: { sensitivity: Sensitivity; y: number; bandHeight: number; lowX: number | null; highX: number | null; swing: number }[];
}

export function layoutTornado(
  sensitivities: Sensitivity[],
  base: number,
  width: number,
  options: { labelWidth?: number; rightWidth?: number; rowHeight?: number; tickCharWidth?: number } = {},
): TornadoLayout {
  const usable = sensitivities.filter((s) => s.low.expandedNpv !== null || s.high.expandedNpv !== null);
  const swing = (s: Sensitivity) => Math.abs((s.high.expandedNpv ?? base) - (s.low.expandedNpv ?? base));
  const sorted = [...usable].sort((a, b) => swing(b) - swing(a));
  const rowHeight = options.rowHeight ?? 34;
  const margin = { top: 8, right: options.rightWidth ?? 64, bottom: 28, left: options.labelWidth ?? 220 };
  const height = margin.top + margin.bottom + rowHeight * Math.max(sorted.length, 1);
  const values = sorted.flatMap((s) => [s.low.expandedNpv ?? base, s.high.expandedNpv ?? base]).concat(base);
  const x = scaleLinear()
    .domain([Math.min(...values), Math.max(...values)])
    .nice()
    .range([margin.left, width - margin.right]);
  const y = scaleBand()
    .domain(sorted.map((s) => s.parameter))
    .range([margin.top, height - margin.bottom])
    .padding(0.25);
  return {
    width,
    height,
    margin,
    baseX: x(base),
    ticks: axisTicks(x, 5, { charWidth: options.tickCharWidth }).map((t) => ({ value: t.value, x: t.at, label: t.label })),
    rows: sorted.map((s) => ({
      sensitivity: s,
      y: y(s.parameter) ?? 0,
      bandHeight: y.bandwidth(),
      lowX: s.low.expandedNpv === null ? null : x(s.low.expandedNpv),
      highX: s.high.expandedNpv === null ? null : x(s.high.expandedNpv),
      swing: swing(s),
    })),
  };
}
