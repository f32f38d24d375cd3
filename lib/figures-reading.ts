/**
 * Leeway's reading of the figures, stated as what the model indicates: whether the case is worth
 * undertaking with its flexibility, and why. It is a suggestion the analyst may start from when
 * writing their recommendation at submission; the board pack prints it beside theirs, labelled as
 * generated, never as the recommendation (the decision rests with the organisation).
 */
import { formatMoney } from './format';

export function readingOfFigures(
  figures: { staticNpv: number; expandedNpv: number; optionPremium: number },
  currency: string,
): { headline: string; body: string } {
  const { staticNpv, expandedNpv, optionPremium } = figures;
  const s = formatMoney(staticNpv, currency);
  const e = formatMoney(expandedNpv, currency);
  const p = formatMoney(optionPremium, currency);
  if (expandedNpv <= 0)
    return {
      headline: 'The model does not support proceeding on these assumptions.',
      body: `Even with its flexibility the case is worth ${e} (static NPV ${s}).`,
    };
  if (staticNpv < 0)
    return {
      headline: 'The model supports proceeding, provided the options are kept open and used as the decision rules say.',
      body: `The static NPV is negative (${s}), but the rights management holds are worth ${p}, which makes the expanded NPV positive (${e}). The value depends on acting on the decision rules below.`,
    };
  return {
    headline: 'The model supports proceeding.',
    body: `The case is worth ${s} without flexibility and ${e} with it; the options add ${p}.`,
  };
}
