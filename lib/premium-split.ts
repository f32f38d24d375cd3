/**
 * The option premium in two parts, in words, from the engine's `premiumSplit`: what the rights
 * add on a known path (a better plan, worth having without any uncertainty) and what they add
 * because the future is uncertain (flexibility). Shared by the results page and the board pack.
 */
import type { ValuationResult } from '@/lattice';
import { formatMoney } from './format';

export function premiumSplitText(result: Pick<ValuationResult, 'optionPremium' | 'premiumSplit'>, currency?: string): string | null {
  const split = result.premiumSplit;
  if (!split) return null;
  return (
    `Of the option premium of ${formatMoney(result.optionPremium, currency)}, ${formatMoney(split.betterPlan, currency)} is a better plan ` +
    `(what the rights add with no uncertainty at all) and ${formatMoney(split.uncertainty, currency)} is flexibility under uncertainty.`
  );
}
