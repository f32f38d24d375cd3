/** Axis labels never repeat: decimals follow the tick spacing (the convergence axis read "20.1" twice). */
import { scaleLinear, scaleLog } from 'd3';
import { describe, expect, it } from 'vitest';
import { axisTicks, logAxisTicks, SCREEN_LABEL_CHAR } from '@/lib/charts/axis';
import { tickDigits } from '@/lib/charts/tick-digits';
import { formatMoney } from '@/lib/format';

describe('tick labels', () => {
  it.each([
    [[30, 31, 32], 0],
    [[30, 30.5, 31], 1],
    [[20, 20.2, 20.4], 1],
    [[20.05, 20.1, 20.15], 2],
  ])('%j → %d decimals', (ticks, digits) => expect(tickDigits(ticks)).toBe(digits));

  it('gives distinct labels on narrow and wide domains', () => {
    for (const [low, high] of [
      [20.01, 20.19],
      [31.5, 33.8],
      [-2, 140],
      [0.001, 0.004],
    ] as const) {
      const ticks = scaleLinear().domain([low, high]).nice().ticks(4);
      const labels = ticks.map((t) => formatMoney(t, undefined, tickDigits(ticks)));
      expect(new Set(labels).size).toBe(labels.length);
    }
  });

  it('are what every chart and the board pack print: axisTicks places and labels them once', () => {
    // A waterfall whose bars span 0 to 2 (a small case): the old labels with no decimals read "0, 1, 1, 2, 2".
    const small = axisTicks(scaleLinear().domain([0, 2]).range([0, 100]), 5);
    expect(small.map((t) => t.label)).toEqual(['0.0', '0.5', '1.0', '1.5', '2.0']);
    expect(small.map((t) => t.at)).toEqual([0, 25, 50, 75, 100]);
    const wide = axisTicks(scaleLinear().domain([-1500, 1500]).range([0, 300]), 6);
    expect(wide.map((t) => t.label)).toEqual(['−1,500', '−1,000', '−500', '0', '500', '1,000', '1,500']);
  });

  it('thin an axis across a narrow chart until its labels have room, and leave a wide one as it was', () => {
    // The portfolio's NPV chart on a 390 px phone has about 90 px for −20 to 30: its six ticks
    // printed "−20−1001020 30" with no space between them.
    const phone = scaleLinear().domain([-16, 25]).nice().range([0, 90]);
    const room = (ticks: { label: string }[]) => SCREEN_LABEL_CHAR * (Math.max(...ticks.map((t) => t.label.length)) + 2);
    expect(axisTicks(phone, 6).length).toBeGreaterThan(3);
    const thinned = axisTicks(phone, 6, { charWidth: SCREEN_LABEL_CHAR });
    expect(thinned.length).toBeGreaterThanOrEqual(1);
    for (let k = 1; k < thinned.length; k++) expect(thinned[k]!.at - thinned[k - 1]!.at).toBeGreaterThanOrEqual(room(thinned));
    // Thinned ticks are still d3's round values, in order.
    expect(thinned.every((t, k) => k === 0 || t.value > thinned[k - 1]!.value)).toBe(true);
    // On a desktop (600 px) every tick has room: the same ticks as without the option.
    const desk = scaleLinear().domain([-16, 25]).nice().range([0, 600]);
    expect(axisTicks(desk, 6, { charWidth: SCREEN_LABEL_CHAR })).toEqual(axisTicks(desk, 6));
  });

  it('label a log axis by powers of ten, none alike', () => {
    // The older extrusion line's decision map spans about 10⁻⁸ to 300: its labels read "100, 1, 0.01, 0.00, 0.00, 0.00".
    const wide = logAxisTicks(scaleLog().domain([2e-8, 300]).range([300, 0]), 4);
    // d3 keeps every second power at this count.
    expect(wide.map((t) => t.label)).toEqual(['10⁻⁶', '10⁻⁴', '0.01', '1', '100']);
    expect(logAxisTicks(scaleLog().domain([5e-4, 2]).range([300, 0]), 4).map((t) => t.label)).toEqual(['0.001', '0.01', '0.1', '1']);
    // Under three powers of ten, 2 and 5 times each power too: the cold-storage hub's decision
    // map, fitted to its window (about 10 to 350), was labelled "100" alone.
    const narrow = logAxisTicks(scaleLog().domain([20, 3000]).range([300, 0]), 4);
    expect(narrow.map((t) => t.label)).toEqual(['20', '50', '100', '200', '500', '1,000', '2,000']);
    expect(narrow[2]!.at).toBeCloseTo(300 * (1 - Math.log(100 / 20) / Math.log(3000 / 20)), 9);
    expect(logAxisTicks(scaleLog().domain([10.1, 348]).range([300, 0]), 4).map((t) => t.label)).toEqual(['20', '50', '100', '200']);
    expect(logAxisTicks(scaleLog().domain([3e-6, 4e-5]).range([300, 0]), 4).map((t) => t.label)).toEqual(['5×10⁻⁶', '10⁻⁵', '2×10⁻⁵']);
  });
});
