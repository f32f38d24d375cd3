/**
 * Geometry of the "NPV with and without flexibility" chart: one row per item, a hollow mark at
 * the static NPV and a filled mark at the expanded NPV joined by a bar (the option premium),
 * and a zero line. Pure (d3-scale only), so the web chart and the PDF chart draw the same thing.
 */
import { scaleBand, scaleLinear } from 'd3';
import { axisTicks } from './axis';

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
  rows: (NpvPair & { y: number; staticX: number; expandedX: number })[];
  rowHeight: number;
}

export function layoutNpvComparison(
  items: NpvPair[],
  width: number,
  options: { rowHeight?: number; labelWidth?: number; tickCharWidth?: number } = {},
): NpvComparisonLayout {
  const rowHeight = options.rowHeight ?? 44;
  const margin = { top: 12, right: 130, bottom: 32, left: options.labelWidth ?? 200 };
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
    rows: items.map((i) => ({ ...i, y: (y(i.id) ?? 0) + y.bandwidth() / 2, staticX: x(i.staticNpv), expandedX: x(i.expandedNpv) })),
  };
}
