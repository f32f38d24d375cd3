/**
 * The words under the bridge's bars. On a phone a bar's band is narrower than a long word, and
 * the labels were cut ("Expan… NPV", "Toget… vs. alone" at 320 and 360 px): now every bar is
 * marked with its number and the chart lists the names whole. Wide enough, the names stay under
 * their bars. Figures and names invented.
 */
import { describe, expect, it } from 'vitest';
import { layoutWaterfall, waterfallLabels, waterfallSteps } from '@/lib/charts/waterfall';

const right = (id: string, standalone: number) => ({ id, standalone }) as never;
const result = {
  staticNpv: -11,
  expandedNpv: 31,
  optionPremium: 42,
  interaction: -3,
  rights: [right('Phase 2', 20), right('Sell the plant', 19), right('Run at half', 6)],
};
const steps = waterfallSteps(result);
const names = ['Static NPV', 'Phase 2', 'Sell the plant', 'Run at half', 'Together vs. alone', 'Expanded NPV'];

describe('the bridge chart labels', () => {
  it('on a desktop-wide chart, keep each name whole under its bar and need no key', () => {
    const layout = layoutWaterfall(steps, 800, 328, 72);
    const labels = waterfallLabels(layout.bars, 12, 4);
    expect(labels.key).toBeNull();
    expect(labels.lines.map((l) => l.join(' '))).toEqual(names);
  });

  it('on a 270 px chart (a 320 px phone), mark the bars 1 to 6 and list every name whole', () => {
    const layout = layoutWaterfall(steps, 270, 328, 72);
    const labels = waterfallLabels(layout.bars, 12, 4);
    expect(labels.lines).toEqual([['1'], ['2'], ['3'], ['4'], ['5'], ['6']]);
    expect(labels.key).toEqual(names.map((label, k) => ({ mark: String(k + 1), label })));
  });

  it('never shows a cut name: with no key, no line ends in "…", at any width from 240 to 900 px', () => {
    for (let width = 240; width <= 900; width += 10) {
      const labels = waterfallLabels(layoutWaterfall(steps, width, 328, 72).bars, 12, 4);
      if (labels.key === null) expect(labels.lines.flat().some((line) => line.endsWith('…'))).toBe(false);
      else expect(labels.key.map((k) => k.label)).toEqual(names);
    }
  });
});
