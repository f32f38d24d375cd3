/**
 * A right's terms in one sentence, as the comparison, the workbook and the board pack print them.
 * The mothball right speaks of mothballing and restarting (it read "switch to 0 % of scale …
 * earning … while switched" after engine 4.0.0 renamed the kind), and costs read as entered.
 */
import { describe, expect, it } from 'vitest';
import { describeCost, describeOption } from '@/lib/option-words';

describe('the terms of a right in words', () => {
  it('words a mothball right as mothballing and restarting', () => {
    const mothball = {
      kind: 'mothball',
      id: 'Pause',
      toScale: 0,
      cost: 1.5,
      backCost: 3,
      flowPerYear: -0.5,
      window: { kind: 'american', from: 0, to: 6 },
    } as const;
    expect(describeOption(mothball, 'EUR')).toBe(
      'mothball to 0 % of scale for EUR 1.5 and restart for EUR 3.0, with a cash flow of EUR −0.5 a year while mothballed, any time in years 0–6',
    );
  });

  it('words fixed, growing and stepped costs', () => {
    expect(describeCost(95, 'EUR')).toBe('EUR 95.0');
    expect(describeCost({ amount: 95, growth: 0.03 }, 'EUR')).toBe('EUR 95.0 growing 3.0 % a year');
    expect(
      describeCost(
        [
          { from: 0, amount: 90 },
          { from: 3, amount: 110 },
        ],
        'EUR',
      ),
    ).toBe('EUR 90.0 from year 0, then EUR 110.0 from year 3');
  });
});
