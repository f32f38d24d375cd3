/**
 * The option cards' note on a right that reads as part of the plan (lattice/plan-like.ts): the
 * analyst sees it on the card whose terms cause it, not only among Results' warnings. A fresh
 * abandonment card on a short schedule, for one, sells at the end for a salvage the project is
 * no longer worth: a certain gain, not an option.
 */
import { isPlanLike, rightIds, type OptionTemplate, type RightResult } from '@/lattice';
import { formatPercent } from './format';

/**
 * Notes by card position, for the cards whose right in `rights` (a result of valuing exactly
 * `options`) is plan-like. A card is matched by its engine id and kind, so a result of an
 * earlier set of cards notes nothing on the wrong one.
 */
export function planLikeNotes(options: OptionTemplate[], rights: RightResult[]): Record<number, string> {
  const ids = rightIds(options);
  const notes: Record<number, string> = {};
  options.forEach((option, k) => {
    const right = rights.find((r) => r.id === ids[k] && r.kind === option.kind);
    if (right && isPlanLike(right))
      notes[k] =
        `At these terms it is used in ${formatPercent(right.exerciseProbability)} of outcomes (risk-neutral): it works as part of the plan more than as an option. ` +
        'Consider putting it in the cash flows, or terms that leave a real choice; Results splits the premium into a better plan and flexibility under uncertainty.';
  });
  return notes;
}
