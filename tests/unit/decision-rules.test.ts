/** Decision rules in words, from exercise boundaries (wording: common practice, no source). */
import { describe, expect, it } from 'vitest';
import { decisionRule } from '@/lib/decision-rules';

describe('decision rules', () => {
  it('reads an expansion from the low edge of its region, first and last open step', () => {
    const rule = decisionRule({
      id: 'Phase 2',
      kind: 'expand',
      exerciseProbability: 0.2,
      boundary: [
        { t: 1, low: null, high: null },
        { t: 2, low: 240.04, high: 900 },
        { t: 3, low: 250, high: 1000 },
        { t: 4, low: 265.5, high: 1100 },
      ],
    });
    expect(rule.text).toBe('Expand (Phase 2) between years 2 and 4 when the project is worth more than 240.0 (year 2) to 265.5 (year 4).');
  });

  it('reads an abandonment from the high edge, and a flat threshold once', () => {
    const rule = decisionRule({
      id: 'Sell',
      kind: 'abandon',
      exerciseProbability: 0.4,
      boundary: [
        { t: 0.5, low: 1, high: 80 },
        { t: 1, low: 1, high: 80.1 },
      ],
    });
    expect(rule.text).toBe('Abandon (Sell) between years 0.5 and 1 when the project is worth less than 80.0.');
  });

  it('says when a right is never used', () => {
    expect(decisionRule({ id: 'X', kind: 'contract', exerciseProbability: 0, boundary: [] }).text).toBe(
      'X: never exercised on this lattice; it adds no value as specified.',
    );
  });
});
