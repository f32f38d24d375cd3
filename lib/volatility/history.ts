/**
 * Volatility from a history of dated values (a comparable's price, a commodity, a past project
 * value): the annualised standard deviation of log returns, with the observation frequency
 * detected from the dates and a confidence interval.
 *
 * Method (common practice; e.g. Hull, Options, Futures, and Other Derivatives, "Estimating
 * volatility from historical data"): u_i = ln(S_i / S_{i−1}); s = sample standard deviation of
 * the u_i (n − 1 in the denominator); σ = s·√f with f observations a year. Interval: if the
 * returns are independent and normal, (n − 1)s²/σ² follows χ² with n − 1 degrees of freedom,
 * so σ lies in [s·√((n−1)/χ²_{1−α/2}), s·√((n−1)/χ²_{α/2})]·√f with probability 1 − α.
 */
import { jStat } from 'jstat';
import { z } from 'zod';
import { deviation } from 'd3';

export const MIN_RETURNS = 10;
export const MAX_OBSERVATIONS = 100_000;

export const historySeriesSchema = z
  .array(
    z.object({
      date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Dates are written YYYY-MM-DD.'),
      value: z.number({ error: 'Enter a number.' }).finite(),
    }),
  )
  .min(MIN_RETURNS + 1, `Give at least ${MIN_RETURNS + 1} dated values (${MIN_RETURNS} returns).`)
  .max(MAX_OBSERVATIONS, `At most ${MAX_OBSERVATIONS.toLocaleString('en-GB')} values.`);

export type HistoryPoint = z.infer<typeof historySeriesSchema>[number];

export type Frequency = 'daily (trading days)' | 'daily (calendar days)' | 'weekly' | 'monthly' | 'quarterly' | 'annual';

/** Observations a year for each frequency (252 trading days: common practice, no source). */
export const periodsPerYear: Record<Frequency, number> = {
  'daily (trading days)': 252,
  'daily (calendar days)': 365,
  weekly: 52,
  monthly: 12,
  quarterly: 4,
  annual: 1,
};

export interface HistoryEstimate {
  volatility: number;
  frequency: Frequency;
  periodsPerYear: number;
  observations: number;
  returns: number;
  /** 95 % interval for the annualised volatility. */
  interval: [number, number];
  confidence: number;
  periodStdDev: number;
  first: string;
  last: string;
  warnings: string[];
  /** The series as used (sorted) and its log returns, for the charts. */
  series: HistoryPoint[];
  logReturns: { date: string; value: number }[];
}

/** A problem with the series that stops the estimate; `row` is 1-based in the series given. */
export class HistoryError extends Error {
  constructor(
    message: string,
    readonly row?: number,
  ) {
    super(message);
    this.name = 'HistoryError';
  }
}

const DAY = 86_400_000;
const dayOf = (date: string) => Date.parse(`${date}T00:00:00Z`) / DAY;

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** The frequency whose spacing matches the median gap between dates, or null when none does. */
export function detectFrequency(dates: string[]): { frequency: Frequency; medianGap: number } | { frequency: null; medianGap: number } {
  const days = dates.map(dayOf);
  const gaps = days.slice(1).map((d, k) => d - days[k]!);
  const medianGap = median(gaps);
  if (medianGap <= 1.5) {
    // Trading-day data skips weekends; calendar-day data has them.
    const weekend = days.filter((d) => [0, 6].includes(new Date(d * DAY).getUTCDay())).length;
    return { frequency: weekend / days.length < 0.05 ? 'daily (trading days)' : 'daily (calendar days)', medianGap };
  }
  if (medianGap >= 5 && medianGap <= 9) return { frequency: 'weekly', medianGap };
  if (medianGap >= 27 && medianGap <= 35) return { frequency: 'monthly', medianGap };
  if (medianGap >= 85 && medianGap <= 97) return { frequency: 'quarterly', medianGap };
  if (medianGap >= 360 && medianGap <= 370) return { frequency: 'annual', medianGap };
  return { frequency: null, medianGap };
}

export function estimateFromHistory(input: HistoryPoint[], confidence = 0.95): HistoryEstimate {
  const warnings: string[] = [];
  input.forEach((p, k) => {
    if (Number.isNaN(dayOf(p.date))) throw new HistoryError(`Row ${k + 1}: “${p.date}” is not a date.`, k + 1);
    if (!(p.value > 0)) throw new HistoryError(`Row ${k + 1} (${p.date}): the value is ${p.value}; log returns need values above 0.`, k + 1);
  });
  const series = input.map((p, k) => ({ ...p, row: k + 1 }));
  const sorted = [...series].sort((a, b) => dayOf(a.date) - dayOf(b.date));
  if (sorted.some((p, k) => p !== series[k])) warnings.push('The dates were not in order; they were sorted before computing returns.');
  for (let k = 1; k < sorted.length; k++)
    if (sorted[k]!.date === sorted[k - 1]!.date)
      throw new HistoryError(`Rows ${sorted[k - 1]!.row} and ${sorted[k]!.row} have the same date, ${sorted[k]!.date}.`, sorted[k]!.row);
  if (sorted.length < MIN_RETURNS + 1) throw new HistoryError(`Give at least ${MIN_RETURNS + 1} dated values (${MIN_RETURNS} returns); got ${sorted.length}.`);

  const detected = detectFrequency(sorted.map((p) => p.date));
  if (detected.frequency === null)
    throw new HistoryError(
      `The dates are irregular: they are ${detected.medianGap.toFixed(1)} days apart at the median, which matches no daily, weekly, monthly, quarterly or annual series.`,
    );
  const frequency = detected.frequency;
  const expected = frequency.startsWith('daily') ? 1 : detected.medianGap;
  // A gap is more than three usual spacings (more than a long weekend for daily data).
  const gapLimit = frequency.startsWith('daily') ? 5 : 3 * expected;
  const gaps: string[] = [];
  for (let k = 1; k < sorted.length; k++) {
    const gap = dayOf(sorted[k]!.date) - dayOf(sorted[k - 1]!.date);
    if (gap > gapLimit) gaps.push(`${sorted[k - 1]!.date} to ${sorted[k]!.date} (${gap} days)`);
  }
  if (gaps.length > 0)
    warnings.push(
      `${gaps.length} gap${gaps.length > 1 ? 's' : ''} in the series: ${gaps.slice(0, 3).join('; ')}${gaps.length > 3 ? '; …' : ''}. Returns across a gap cover more than one period.`,
    );

  const logReturns = sorted.slice(1).map((p, k) => ({ date: p.date, value: Math.log(p.value / sorted[k]!.value) }));
  const n = logReturns.length;
  // The sample standard deviation (n − 1) of the log returns, by d3 (Welford's method).
  const periodStdDev = deviation(logReturns, (r) => r.value) ?? NaN;
  if (!(periodStdDev > 0)) throw new HistoryError('The values never change, so their volatility is zero: the lattice needs a positive volatility.');
  const f = periodsPerYear[frequency];
  const alpha = 1 - confidence;
  const dof = n - 1;
  const interval: [number, number] = [
    periodStdDev * Math.sqrt(dof / jStat.chisquare.inv(1 - alpha / 2, dof)) * Math.sqrt(f),
    periodStdDev * Math.sqrt(dof / jStat.chisquare.inv(alpha / 2, dof)) * Math.sqrt(f),
  ];
  if (n < 30) warnings.push(`Only ${n} returns: the interval is wide; a longer history narrows it.`);
  return {
    volatility: periodStdDev * Math.sqrt(f),
    frequency,
    periodsPerYear: f,
    observations: sorted.length,
    returns: n,
    interval,
    confidence,
    periodStdDev,
    first: sorted[0]!.date,
    last: sorted.at(-1)!.date,
    warnings,
    series: sorted.map(({ date, value }) => ({ date, value })),
    logReturns,
  };
}
