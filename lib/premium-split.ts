/**
 * The option premium in two parts, in words, from the engine's `premiumSplit`: what the rights
 * add on a known path (a better plan, worth having without any uncertainty) and what they add
 * because the future is uncertain (flexibility). Shared by the results page and the board pack.
 */
import type { ValuationResult } from '@/lattice';
import { formatMoney, formatNumber } from './format';
import { readNumberText } from './number-text';

/** A figure as the sentence shows it (rounded to one decimal), read back as a number. */
function shown(value: number): number {
  const read = readNumberText(formatNumber(value));
  return read.ok ? read.value : value;
}

export function premiumSplitText(result: Pick<ValuationResult, 'optionPremium' | 'premiumSplit'>, currency?: string): string | null {
  const split = result.premiumSplit;
  if (!split) return null;
  // 16.04 + 15.06 = 31.1 reads as 16.0 + 15.1 = 31.1, but 15.96 + 15.16 = 31.12 as 16.0 + 15.2 = 31.1:
  // say so rather than leave a committee to find the parts do not add up.
  const addsUp = Math.abs(shown(split.betterPlan) + shown(split.uncertainty) - shown(result.optionPremium)) < 1e-9;
  return (
    `Of the option premium of ${formatMoney(result.optionPremium, currency)}, ${formatMoney(split.betterPlan, currency)} is a better plan ` +
    `(what the rights add with no uncertainty at all) and ${formatMoney(split.uncertainty, currency)} is flexibility under uncertainty.` +
    (addsUp ? '' : ' Each figure is rounded on its own, so the two parts differ from the premium by 0.1.')
  );
}
