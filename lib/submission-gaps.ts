/**
 * What a committee would read as missing or doubtful in a case about to be submitted, in words,
 * for the submit dialog. Nothing here blocks a submission: the organisation's policy decides what
 * a case needs, and the board pack prints what is there. Two things are read: the volatility,
 * the figure an option premium rests on most (without a stated source the pack prints "Not
 * stated"), and the engine's warnings on the figures, which the pack prints as Results does.
 */
import { formatPercent } from './format';
import type { CaseInput } from './validations/case';
import { volatilitySourceText } from './volatility/method-words';
import { warningSentence } from './warning-words';

export function submissionGaps(input: Pick<CaseInput, 'settings'>, warnings: string[] = []): string[] {
  const gaps: string[] = [];
  const source = input.settings.volatilitySource;
  if (!source || (source.method === 'direct' && !source.note.trim()))
    gaps.push(
      `The volatility (${formatPercent(input.settings.volatility)}) has no stated source or justification: the board pack prints “${volatilitySourceText(source && { ...source, note: source.note.trim() })}” beside it. The Uncertainty tab records one.`,
    );
  for (const warning of warnings) gaps.push(`The board pack prints the engine’s warning: ${warningSentence(warning)}`);
  return gaps;
}
