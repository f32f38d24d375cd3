/**
 * The caution shown wherever valuations appear (pages, workbooks and every board pack): results
 * are model-based estimates, and decisions rest with the organisation.
 */
export const VALUATION_CAUTION =
  'Valuations are model-based estimates that rest on stated assumptions (a lognormal project value, constant volatility, the chosen discount and risk-free rates). Decisions rest with your organisation’s capital-approval policy, its qualified advisers and the accounting and regulatory rules that apply to it.';
