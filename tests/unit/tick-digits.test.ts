/** Axis labels never repeat: decimals follow the tick spacing (the convergence axis read "20.1" twice). */
import { scaleLinear } from 'd3';
import { describe, expect, it } from 'vitest';
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
});
