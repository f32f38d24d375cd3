/**
 * The caution shown wherever valuations appear (and in every board pack): results are
 * model-based estimates, and decisions rest with the organisation.
 */
export const VALUATION_CAUTION =
  'Valuations are model-based estimates that rest on stated assumptions (a lognormal project value, constant volatility, the chosen discount and risk-free rates). Decisions rest with your organisation’s capital-approval policy, its qualified advisers and the accounting and regulatory rules that apply to it.';

export function ValuationCaution() {
  return <p className="rounded-md border border-line bg-paper-sunk px-4 py-3 text-caption text-ink-soft">{VALUATION_CAUTION}</p>;
}
