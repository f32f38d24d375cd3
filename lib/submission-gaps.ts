/**
 * What a committee would read as missing in a case about to be submitted, in words, for the
 * submit dialog. Nothing here blocks a submission: the organisation's policy decides what a case
 * needs, and the board pack prints what is there. The one gap read today is the volatility, the
 * figure an option premium rests on most: without a stated source the pack prints "Not stated".
 */
import { formatPercent } from './format';
import type { CaseInput } from './validations/case';

export function submissionGaps(input: Pick<CaseInput, 'settings'>): string[] {
  const source = input.settings.volatilitySource;
  if (!source || (source.method === 'direct' && !source.note.trim()))
    return [
      `The volatility (${formatPercent(input.settings.volatility)}) has no stated source or justification: the board pack prints “${source ? 'Entered directly' : 'Not stated'}” beside it. The Uncertainty tab records one.`,
    ];
  return [];
}
