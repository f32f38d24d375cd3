/**
 * The cash-flow arithmetic behind a case: static NPV, V0 and the payout schedule.
 * - Against `financial` 0.2.4 (a port of numpy-financial): npv(rate, values) discounts values[0]
 *   at t = 0, like our year 0; agreement to 1e-9 relative.
 * - A hand-worked example (common practice, no source), arithmetic in the comments.
 */
import fc from 'fast-check';
import { npv } from 'financial';
import { describe, expect, it } from 'vitest';
import { analyseCashFlows, type CashFlowYear } from '@/lib/cash-flows';

const year = (y: number, revenue: number, operatingCost: number, tax: number, capex = 0, workingCapital = 0): CashFlowYear => ({
  year: y,
  revenue,
  operatingCost,
  capex,
  tax,
  workingCapital,
});

describe('cash-flow arithmetic', () => {
  it('works the hand example: capex 100 now, then 40 a year for three years at 10 %', () => {
    // OCF = 80 − 30 − 10 = 40 in years 1–3.
    // V0 = 40/1.1 + 40/1.21 + 40/1.331 = 36.3636364 + 33.0578512 + 30.0525920 = 99.4740796
    // static NPV = 99.4740796 − 100 = −0.5259204
    // Payouts: V_1 = 40 + 40/1.1 + 40/1.21 = 109.421488, f_1 = 40/109.421488 = 0.365559;
    //          V_2 = 40 + 40/1.1 = 76.363636, f_2 = 40/76.363636 = 0.523810; year 3 pays out the
    //          rest (f_3 = 1, held just below 1 so the lattice keeps a positive value).
    const a = analyseCashFlows({ wacc: 0.1, rows: [year(0, 0, 0, 0, 100), year(1, 80, 30, 10), year(2, 80, 30, 10), year(3, 80, 30, 10)] });
    expect(a.underlyingValue).toBeCloseTo(99.4740796, 6);
    expect(a.investment).toBeCloseTo(100, 12);
    expect(a.npvAtWacc).toBeCloseTo(-0.5259204, 6);
    expect(a.payouts.map((p) => p.at)).toEqual([1, 2, 3]);
    expect(a.payouts[0]!.fraction).toBeCloseTo(0.365559, 6);
    expect(a.payouts[1]!.fraction).toBeCloseTo(0.52381, 6);
    expect(a.payouts[2]!.fraction).toBe(0.999999);
    expect(a.totals.freeCashFlow).toBe(20);
  });

  it('agrees with numpy-financial’s npv on random schedules (end-of-year timing)', () => {
    const row = fc.record({
      revenue: fc.double({ min: 0, max: 500, noNaN: true }),
      operatingCost: fc.double({ min: 0, max: 300, noNaN: true }),
      capex: fc.double({ min: 0, max: 200, noNaN: true }),
      tax: fc.double({ min: 0, max: 50, noNaN: true }),
      workingCapital: fc.double({ min: -20, max: 20, noNaN: true }),
    });
    fc.assert(
      fc.property(fc.array(row, { minLength: 1, maxLength: 15 }), fc.double({ min: 0.01, max: 0.3, noNaN: true }), (list, wacc) => {
        const rows = list.map((r, k) => ({ year: k, ...r }));
        const a = analyseCashFlows({ wacc, rows });
        const reference = npv(
          wacc,
          a.rows.map((r) => r.freeCashFlow),
        );
        expect(Math.abs(a.npvAtWacc - reference)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(reference)));
        expect(Math.abs(a.npvAtWacc - (a.underlyingValue - a.investment))).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(reference)));
      }),
      { numRuns: 200 },
    );
  });

  it('moves every cash flow after year 0 half a year earlier with mid-year timing', () => {
    const end = analyseCashFlows({ wacc: 0.08, rows: [year(0, 0, 0, 0, 50), year(1, 60, 20, 5), year(2, 60, 20, 5)] });
    const mid = analyseCashFlows({ wacc: 0.08, timing: 'mid-year', rows: [year(0, 0, 0, 0, 50), year(1, 60, 20, 5), year(2, 60, 20, 5)] });
    expect(mid.underlyingValue).toBeCloseTo(end.underlyingValue * Math.sqrt(1.08), 10);
    expect(mid.investment).toBe(end.investment);
  });

  it('reports a negative operating year instead of taking a negative payout, and refuses gaps in years', () => {
    const a = analyseCashFlows({ wacc: 0.1, rows: [year(1, 10, 30, 0), year(2, 80, 30, 0), year(3, 80, 30, 0)] });
    expect(a.payouts.map((p) => p.at)).toEqual([2, 3]);
    expect(a.warnings[0]).toContain('Year 1: the operating cash flow is negative');
    expect(() => analyseCashFlows({ wacc: 0.1, rows: [year(1, 1, 0, 0), year(3, 1, 0, 0)] })).toThrow('Years must follow one another: expected 2, got 3.');
  });

  it('says once for a run of years what it would otherwise repeat for each', () => {
    // Years 1 and 2 lose money, 3 and 4 earn: two negative years, one sentence.
    const early = analyseCashFlows({ wacc: 0.1, rows: [year(0, 0, 0, 0, 20), year(1, 5, 30, 0), year(2, 5, 30, 0), year(3, 80, 30, 0), year(4, 80, 30, 0)] });
    expect(early.warnings).toEqual(['Years 1–2: the operating cash flow is negative each year; the lattice takes no payout in them.']);
    // A schedule whose later years are worth nothing: years 1–3 in one sentence, then V0 ≤ 0.
    const worthless = analyseCashFlows({ wacc: 0.1, rows: [year(0, 0, 0, 0, 20), year(1, 0, 1, 0), year(2, 0, 1, 0), year(3, 0, 1, 0)] });
    expect(worthless.warnings).toEqual([
      'Years 1–3: the value of the cash flows still to come is not positive, so no payout is derived.',
      'The operating cash flows are worth nothing or less (V0 ≤ 0): the lattice needs a positive project value.',
    ]);
    expect(worthless.blank).toBe(false);
  });

  it('treats a schedule with nothing entered as blank, not as six warnings', () => {
    const blank = analyseCashFlows({ wacc: 0.085, rows: [0, 1, 2, 3, 4, 5].map((t) => year(t, 0, 0, 0)) });
    expect(blank).toMatchObject({ blank: true, warnings: [], payouts: [] });
  });
});
