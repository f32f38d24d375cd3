import type { CaseSettings } from '@/lib/validations/case';

/** How a case's volatility was obtained, as a label (the case's settings, the validation report). */
export const volatilityMethodLabels = { direct: 'Entered directly', history: 'Estimated from history', 'monte-carlo': 'Estimated by Monte Carlo' } as const;

/**
 * Where a case's volatility comes from in one line, as the board pack, the workbook and the
 * comparison print it: the method's label, then the analyst's justification. (Each had its own
 * words: "direct: …", "stated directly: …", or the justification alone.)
 */
export function volatilitySourceText(source: CaseSettings['volatilitySource']): string {
  if (!source) return 'Not stated';
  return source.note ? `${volatilityMethodLabels[source.method]}: ${source.note}` : volatilityMethodLabels[source.method];
}
