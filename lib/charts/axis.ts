/**
 * An axis's ticks, for the web charts and the board pack alike: d3's round values, where
 * each sits on the scale, and its label with just enough decimals to tell neighbours apart
 * (lib/charts/tick-digits.ts; grouped thousands and a true minus sign by lib/format.ts). The
 * charts draw these with their own primitives (SVG on the web, react-pdf in the pack) and never
 * format a tick themselves.
 */
import type { ScaleLinear, ScaleLogarithmic } from 'd3';
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

const superscript: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/**
 * A log axis's ticks at whole powers of ten, labelled so that no two read alike: 1,000, 1, 0.01,
 * 0.001, then 10⁻⁴ and below (a fixed number of decimals turned every small power into 0.00).
 */
export function logAxisTicks(scale: ScaleLogarithmic<number, number>, count: number): AxisTick[] {
  return scale
    .ticks(count)
    .map((value) => ({ value, power: Math.round(Math.log10(value)) }))
    .filter(({ value, power }) => Math.abs(value / 10 ** power - 1) < 1e-9)
    .map(({ value, power }) => ({
      value,
      at: scale(value),
      label: power >= -3 ? formatNumber(value, Math.max(0, -power)) : `10${[...String(power)].map((c) => superscript[c]).join('')}`,
    }));
}
