/**
 * A linear axis's ticks, for the web charts and the board pack alike: d3's round values, where
 * each sits on the scale, and its label with just enough decimals to tell neighbours apart
 * (lib/charts/tick-digits.ts; grouped thousands and a true minus sign by lib/format.ts). The
 * charts draw these with their own primitives (SVG on the web, react-pdf in the pack) and never
 * format a tick themselves.
 */
import type { ScaleLinear } from 'd3';
import { formatNumber } from '../format';
import { tickDigits } from './tick-digits';

export interface AxisTick {
  value: number;
  /** The position on the scale's range (pixels or points). */
  at: number;
  label: string;
}

export function axisTicks(scale: ScaleLinear<number, number>, count: number, label: (value: number, digits: number) => string = formatNumber): AxisTick[] {
  const values = scale.ticks(count);
  const digits = tickDigits(values);
  return values.map((value) => ({ value, at: scale(value), label: label(value, digits) }));
}
