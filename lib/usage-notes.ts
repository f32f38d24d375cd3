/**
 * The option cards' notes on a right whose terms make it something other than an option
 * (lattice/right-usage.ts): used almost surely, or never. The analyst reads them on the card
 * whose terms cause them, not only among Results' warnings. A pause that saves nothing a year,
 * for one, is never used.
 */
import { isNeverUsed, isPlanLike, rightIds, type OptionTemplate, type RightResult } from '@/lattice';
import { formatPercent } from './format';

function noteOn(right: RightResult): string | null {
  if (isPlanLike(right))
    return (
      `At these terms it is used in ${formatPercent(right.exerciseProbability)} of outcomes (risk-neutral): it works as part of the plan more than as an option. ` +
      'Consider putting it in the cash flows, or terms that leave a real choice; Results splits the premium into a better plan and flexibility under uncertainty.'
    );
  if (isNeverUsed(right)) return 'At these terms it is never used on this lattice, so it adds no value: check what it costs and what it brings.';
  return null;
}

/**
 * Notes by card position, for the cards whose right in `rights` (a result of valuing exactly
 * `options`) is used almost surely or never. A card is matched by its engine id and kind, so a
 * result of an earlier set of cards notes nothing on the wrong one.
 */
export function usageNotes(options: OptionTemplate[], rights: RightResult[]): Record<number, string> {
  const ids = rightIds(options);
  const notes: Record<number, string> = {};
  options.forEach((option, k) => {
    const right = rights.find((r) => r.id === ids[k] && r.kind === option.kind);
    const note = right ? noteOn(right) : null;
    if (note) notes[k] = note;
  });
  return notes;
}
