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
import { CHAR_WIDTH_EM } from './wrap-label';

export interface AxisTick {
  value: number;
  /** The position on the scale's range (pixels or points). */
  at: number;
  label: string;
}

/** A tick label character's width on screen, px: the charts' 12 px captions, by wrap-label's estimate. */
export const SCREEN_LABEL_CHAR = 12 * CHAR_WIDTH_EM;

export interface AxisOptions {
  label?: (value: number, digits: number) => string;
  /**
   * For an axis across the page: the width of one label character in the scale's range units.
   * Ticks are then thinned (fewer asked of d3) until neighbours are at least the longest label
   * plus two characters apart, so a narrow chart (a phone) keeps readable labels instead of
   * printing them over each other. Up the page, labels stack and need no room.
   */
  charWidth?: number;
}

export function axisTicks(scale: ScaleLinear<number, number>, count: number, options: AxisOptions = {}): AxisTick[] {
  const label = options.label ?? formatNumber;
  const labelled = (n: number) => {
    const values = scale.ticks(n);
    const digits = tickDigits(values);
    return values.map((value) => ({ value, at: scale(value), label: label(value, digits) }));
  };
  let ticks = labelled(count);
  const crowded = (t: AxisTick[]) => t.length > 2 && Math.abs(t[1]!.at - t[0]!.at) < (options.charWidth ?? 0) * (Math.max(...t.map((x) => x.label.length)) + 2);
  // Two ticks are never thinned further: they mark the axis's ends well enough.
  for (let n = count - 1; n >= 1 && crowded(ticks); n--) ticks = labelled(n);
  return ticks;
}

const superscript: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };

/**
 * A log axis's ticks at whole powers of ten, labelled so that no two read alike: 1,000, 1, 0.01,
 * 0.001, then 10⁻⁴ and below (a fixed number of decimals turned every small power into 0.00).
 * An axis that holds fewer than three powers also gets 2 and 5 times each power: fitted to
 * where a right is used, the cold-storage hub's decision map ran from about 10 to 350 and was
 * labelled "100" alone.
 */
export function logAxisTicks(scale: ScaleLogarithmic<number, number>, count: number): AxisTick[] {
  const [low, high] = scale.domain() as [number, number];
  const powers = scale
    .ticks(count)
    .map((value) => ({ value, power: Math.round(Math.log10(value)), times: 1 }))
    .filter(({ value, power }) => Math.abs(value / 10 ** power - 1) < 1e-9);
  const ticks =
    powers.length >= 3
      ? powers
      : Array.from({ length: Math.floor(Math.log10(high)) - Math.floor(Math.log10(low)) + 1 }, (_, k) => Math.floor(Math.log10(low)) + k)
          .flatMap((power) => [1, 2, 5].map((times) => ({ value: times * 10 ** power, power, times })))
          .filter(({ value }) => value >= low * (1 - 1e-12) && value <= high * (1 + 1e-12));
  return ticks.map(({ value, power, times }) => ({
    value,
    at: scale(value),
    label:
      power >= -3 ? formatNumber(value, Math.max(0, -power)) : `${times === 1 ? '' : `${times}×`}10${[...String(power)].map((c) => superscript[c]).join('')}`,
  }));
}
