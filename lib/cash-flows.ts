/**
 * From a yearly cash-flow schedule to what the lattice needs: the NPV at the WACC, the
 * underlying value V0 (PV of the operating cash flows, i.e. without the investment) and the
 * payout schedule (the share of the project's value it pays out each year).
 *
 * Conventions (common practice, no source):
 * - free cash flow FCF = revenue − operating cost − tax − capex − increase in working capital;
 *   the operating cash flow OCF is the same without capex;
 * - discount factors at the WACC, 1/(1+WACC)^t at year ends, or 1/(1+WACC)^(t−½) for years ≥ 1
 *   with mid-year timing (year 0 is always today);
 * - V0 = Σ OCF·DF, investment = Σ capex·DF, static NPV = Σ FCF·DF = V0 − investment;
 * - the payout of year t is OCF_t / V_t, where V_t is the value at t of the OCF from t on
 *   (cum-payout): the project's value drops by that share when the cash is paid (Copeland &
 *   Antikarov's payout ratio). The last year's cash is all that is left, so it is not a payout;
 *   a negative OCF cannot be a payout and is reported.
 */
import { z } from 'zod';

const amount = z.number({ error: 'Enter a number.' }).finite().min(-1e15).max(1e15);

export const cashFlowYearSchema = z.object({
  year: z.number().int().min(0, 'Years start at 0.').max(100, 'At most 100 years.'),
  revenue: amount,
  operatingCost: amount,
  capex: amount,
  tax: amount,
  workingCapital: amount,
});

/** The discount rate of the cash flows, as a fraction a year. */
export const waccSchema = z.number().gt(-0.5, 'WACC must be above −50 %.').lt(1, 'WACC must be below 100 %.');

export const cashFlowScheduleSchema = z
  .object({
    rows: z.array(cashFlowYearSchema).min(1, 'Add at least one year.').max(60, 'At most 60 years.'),
    wacc: waccSchema,
    timing: z.enum(['end-of-year', 'mid-year']).default('end-of-year'),
  })
  .superRefine((value, ctx) => {
    value.rows.forEach((row, k) => {
      if (k > 0 && row.year !== value.rows[k - 1]!.year + 1)
        ctx.addIssue({
          code: 'custom',
          path: ['rows', k, 'year'],
          message: `Years must follow one another: expected ${value.rows[k - 1]!.year + 1}, got ${row.year}.`,
        });
    });
  });

export type CashFlowYear = z.infer<typeof cashFlowYearSchema>;
export type CashFlowSchedule = z.input<typeof cashFlowScheduleSchema>;

export interface CashFlowAnalysis {
  rows: { year: number; freeCashFlow: number; operatingCashFlow: number; discountFactor: number; presentValue: number }[];
  totals: { revenue: number; operatingCost: number; capex: number; tax: number; workingCapital: number; freeCashFlow: number };
  underlyingValue: number;
  investment: number;
  /** Σ free cash flow × discount factor at the WACC. Not the lattice's static NPV (docs/glossary.md), which discounts a defer cost or stage payments at the risk-free rate. */
  npvAtWacc: number;
  /** The capex of each year that has some, and its discount factor at the WACC. */
  outlays: { year: number; amount: number; discountFactor: number }[];
  /** Per year t ≥ 1, the share of the value still to come that the year (t − 1, t] pays out. */
  payouts: { at: number; fraction: number }[];
  /** True while every figure of every year is zero: a new case, nothing entered yet. */
  blank: boolean;
  warnings: string[];
}

/** Why a year pays nothing out, as one sentence for a run of years ("Year 3" or "Years 1–5"). */
const noPayoutReasons = {
  'nothing-left': (years: string) => `${years}: the value of the cash flows still to come is not positive, so no payout is derived.`,
  'negative-year': (years: string, several: boolean) =>
    several
      ? `${years}: the operating cash flow is negative each year; the lattice takes no payout in them.`
      : `${years}: the operating cash flow is negative; the lattice takes no payout that year.`,
};
type NoPayoutReason = keyof typeof noPayoutReasons;

/**
 * One warning per run of consecutive years with the same reason: a new schedule with nothing
 * entered listed the same sentence once for every year.
 */
function noPayoutWarnings(years: { year: number; reason: NoPayoutReason }[]): string[] {
  const runs: { from: number; to: number; reason: NoPayoutReason }[] = [];
  for (const { year, reason } of years) {
    const last = runs.at(-1);
    if (last && last.reason === reason && last.to === year - 1) last.to = year;
    else runs.push({ from: year, to: year, reason });
  }
  return runs.map((r) => noPayoutReasons[r.reason](r.from === r.to ? `Year ${r.from}` : `Years ${r.from}–${r.to}`, r.from !== r.to));
}

export function analyseCashFlows(input: CashFlowSchedule): CashFlowAnalysis {
  const { rows, wacc, timing } = cashFlowScheduleSchema.parse(input);
  const discountFactor = (year: number) => Math.pow(1 + wacc, -(timing === 'mid-year' && year >= 1 ? year - 0.5 : year));
  const warnings: string[] = [];
  const analysed = rows.map((r) => {
    const operatingCashFlow = r.revenue - r.operatingCost - r.tax - r.workingCapital;
    const freeCashFlow = operatingCashFlow - r.capex;
    const df = discountFactor(r.year);
    return { year: r.year, freeCashFlow, operatingCashFlow, discountFactor: df, presentValue: freeCashFlow * df, capex: r.capex };
  });
  const underlyingValue = analysed.reduce((sum, r) => sum + r.operatingCashFlow * r.discountFactor, 0);
  const investment = analysed.reduce((sum, r) => sum + r.capex * r.discountFactor, 0);
  const npvAtWacc = analysed.reduce((sum, r) => sum + r.presentValue, 0);

  const payouts: CashFlowAnalysis['payouts'] = [];
  const noPayout: { year: number; reason: NoPayoutReason }[] = [];
  // Year t's operating cash is the share f_t of the value still to come that the year pays
  // out; the lattice spreads it over the year (t − 1, t] as a yield (docs/engine.md §4). The
  // last year pays out (almost) everything left: the schedule carries no value beyond it.
  for (let k = 0; k < analysed.length; k++) {
    const r = analysed[k]!;
    if (r.year === 0) continue;
    // Value at year t of the operating cash from t on, in year-t money.
    const remaining = analysed.slice(k).reduce((sum, s) => sum + s.operatingCashFlow * s.discountFactor, 0) / r.discountFactor;
    if (!(remaining > 0)) noPayout.push({ year: r.year, reason: 'nothing-left' });
    else if (r.operatingCashFlow < 0) noPayout.push({ year: r.year, reason: 'negative-year' });
    else payouts.push({ at: r.year, fraction: Math.min(r.operatingCashFlow / remaining, 0.999999) });
  }
  // A schedule with nothing entered yet is not wrong: it says so once (the editor shows a
  // prompt), instead of a warning for every year.
  const blank = rows.every((r) => r.revenue === 0 && r.operatingCost === 0 && r.capex === 0 && r.tax === 0 && r.workingCapital === 0);
  if (!blank) {
    warnings.push(...noPayoutWarnings(noPayout));
    if (underlyingValue <= 0) warnings.push('The operating cash flows are worth nothing or less (V0 ≤ 0): the lattice needs a positive project value.');
  }

  const sum = (key: keyof CashFlowYear) => rows.reduce((s, r) => s + r[key], 0);
  return {
    rows: analysed.map(({ capex: _capex, ...rest }) => rest),
    totals: {
      revenue: sum('revenue'),
      operatingCost: sum('operatingCost'),
      capex: sum('capex'),
      tax: sum('tax'),
      workingCapital: sum('workingCapital'),
      freeCashFlow: analysed.reduce((s, r) => s + r.freeCashFlow, 0),
    },
    underlyingValue,
    investment,
    npvAtWacc,
    outlays: analysed.filter((r) => r.capex !== 0).map((r) => ({ year: r.year, amount: r.capex, discountFactor: r.discountFactor })),
    payouts,
    blank,
    warnings,
  };
}
