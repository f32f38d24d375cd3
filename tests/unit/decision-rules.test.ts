/** Decision rules in words, from exercise boundaries (wording: common practice, no source). */
import { describe, expect, it } from 'vitest';
import { readStoredResult, type BoundaryPoint } from '@/lattice';
import { decisionRule, ruleInFull, ruleLines } from '@/lib/decision-rules';

const above = (t: number, critical: number): BoundaryPoint => ({ t, critical, side: 'above', low: critical, high: null });
const below = (t: number, critical: number): BoundaryPoint => ({ t, critical, side: 'below', low: null, high: critical });

describe('decision rules', () => {
  it('reads an expansion from the critical values the engine located, first and last step used', () => {
    const rule = decisionRule({ id: 'Phase 2', kind: 'expand', exerciseProbability: 0.2, boundary: [above(2, 240.04), above(3, 250), above(4, 265.5)] });
    expect(rule.text).toBe('Expand (Phase 2) between years 2 and 4 when the project is worth more than 240.0 (year 2) to 265.5 (year 4).');
    expect(rule.points).toEqual([
      { t: 2, threshold: 240.04 },
      { t: 3, threshold: 250 },
      { t: 4, threshold: 265.5 },
    ]);
  });

  it('reads an abandonment below its critical value, and a flat threshold once', () => {
    const rule = decisionRule({ id: 'Sell', kind: 'abandon', exerciseProbability: 0.4, boundary: [below(0.5, 80), below(1, 80.1)] });
    expect(rule.text).toBe('Abandon (Sell) between years 0.5 and 1 when the project is worth less than 80.0.');
  });

  it('takes the side from the engine, not from the kind of right', () => {
    const rule = decisionRule({ id: 'Odd', kind: 'expand', exerciseProbability: 0.1, boundary: [below(1, 50)] });
    expect(rule.side).toBe('below');
    expect(rule.text).toBe('Expand (Odd) in year 1 when the project is worth less than 50.0.');
  });

  it('says when a right is used at every node of its steps', () => {
    const rule = decisionRule({
      id: 'Sure',
      kind: 'abandon',
      exerciseProbability: 1,
      boundary: [{ t: 8, critical: null, side: 'anywhere', low: null, high: null }],
    });
    expect(rule.text).toBe('Abandon (Sure) in year 8 whatever the project is worth.');
  });

  it('reads results stored by engine 1.x (node ranges, no side) as it did then', () => {
    const stored = [
      { t: 1, low: null, high: null },
      { t: 2, low: 240.04, high: 900 },
    ] as unknown as BoundaryPoint[];
    expect(decisionRule({ id: 'Phase 2', kind: 'expand', exerciseProbability: 0.2, boundary: stored }).text).toBe(
      'Expand (Phase 2) in year 2 when the project is worth more than 240.0.',
    );
  });

  it('words a mothball right with its own verb, as stored by engine 3.x too', () => {
    // Engine 4.0.0 renamed the kind `switch` to `mothball`; the verb map kept the old key, so the
    // demo line's rule read "Exercise (Mothball) …".
    const rule = (stored: unknown) => decisionRule(readStoredResult(stored).rights[0]!).text;
    const right = { id: 'Pause the line', exerciseProbability: 0.3, boundary: [below(1, 4.1), below(5, 0.1)] };
    const expected = 'Mothball (Pause the line) between years 1 and 5 when the project is worth less than 4.1 (year 1) to 0.1 (year 5).';
    expect(rule({ rights: [{ ...right, kind: 'mothball' }] })).toBe(expected);
    expect(rule({ switches: [{ ...right, kind: 'switch' }] })).toBe(expected);
  });

  it('names the right in brackets only when its name says more than the verb', () => {
    // A fresh card keeps its kind's name: "Expand (Expand) …" said it twice.
    const right = { kind: 'expand', exerciseProbability: 0.5, boundary: [above(1, 129.1), above(4, 116.7)] };
    expect(decisionRule({ ...right, id: 'Expand' }).text).toBe(
      'Expand between years 1 and 4 when the project is worth more than 129.1 (year 1) to 116.7 (year 4).',
    );
    expect(decisionRule({ ...right, id: 'Expand the hall' }).text).toMatch(/^Expand \(Expand the hall\) between years 1 and 4/);
  });

  it('adds a sentence for each decision the first use leads to: later stage payments, a restart', () => {
    const stage = decisionRule({
      id: 'Pilot',
      kind: 'stage',
      exerciseProbability: 1,
      boundary: [{ t: 0, critical: null, side: 'anywhere', low: null, high: null }],
      followUps: [
        { from: 'due 2', to: 'due 3', boundary: [above(1, 47.85)] },
        { from: 'due 3', to: 'operating', boundary: [] },
      ],
    });
    expect(ruleLines(stage)).toEqual([
      'Pay the stage (Pilot) in year 0 whatever the project is worth.',
      'Pay the stage (Pilot, payment 2) in year 1 when the project is worth more than 47.9.',
      'Pilot, payment 3: never paid on this lattice.',
    ]);
    const mothball = decisionRule({
      id: 'Pause',
      kind: 'mothball',
      exerciseProbability: 0.3,
      boundary: [below(1, 4)],
      followUps: [{ from: 'paused', to: 'operating', boundary: [above(2, 9), above(3, 9.01)] }],
    });
    expect(ruleInFull(mothball)).toBe(
      'Mothball (Pause) in year 1 when the project is worth less than 4.0. Restart (Pause) between years 2 and 3 when the project is worth more than 9.0.',
    );
  });

  it('names a threshold in between that lies well outside the range of the first and last', () => {
    // A sale whose salvage steps down (95, then 70 from year 4, 35 from year 6): just before each
    // fall the sale is taken at a far higher value. Read from its ends alone (12.8 to 35.0), the
    // rule hid the 66.4 of year 5.9 and the 1.7 of year 6.1 (the demo plant's figures).
    const sale = [below(2.2, 12.84), below(3.917, 58.72), below(4, 6.21), below(5.917, 66.41), below(6.083, 1.72), below(7, 35)];
    expect(decisionRule({ id: 'Sell', kind: 'abandon', exerciseProbability: 0.8, boundary: sale }).text).toBe(
      'Abandon (Sell) between years 2.2 and 7 when the project is worth less than 12.8 (year 2.2) to 35.0 (year 7); in between, the threshold ranges from 1.7 (year 6.1) to 66.4 (year 5.9).',
    );
    // One side only: a rise is named alone.
    expect(decisionRule({ id: 'Sell', kind: 'abandon', exerciseProbability: 0.8, boundary: [below(1, 20), below(2, 40), below(3, 25)] }).text).toBe(
      'Abandon (Sell) between years 1 and 3 when the project is worth less than 20.0 (year 1) to 25.0 (year 3); in between, the threshold rises to 40.0 (year 2).',
    );
    // Within 5 % of the larger end it is a coarse lattice's wobble, not a turn of the rule: the
    // demo plant's expansion (207.7 in year 2, 214.3 in year 2.8, 186.2 in year 4) reads from its ends.
    expect(
      decisionRule({ id: 'Phase 2', kind: 'expand', exerciseProbability: 0.2, boundary: [above(2, 207.7), above(2.8, 214.3), above(4, 186.2)] }).text,
    ).toBe('Expand (Phase 2) between years 2 and 4 when the project is worth more than 207.7 (year 2) to 186.2 (year 4).');
  });

  it('says when a right is never used', () => {
    expect(decisionRule({ id: 'X', kind: 'contract', exerciseProbability: 0, boundary: [] }).text).toBe(
      'X: never exercised on this lattice; it adds no value as specified.',
    );
  });
});
