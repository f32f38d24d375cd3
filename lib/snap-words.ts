/**
 * What the lattice did to dates between its steps, in words for the Results tab and the
 * validation report: a single date moves to the nearest step, an American window keeps the steps
 * inside it (docs/engine.md §2). The engine names each date by its field in the model
 * (`options[1].window.to`); people know the right by its name.
 */
import type { Snap } from '@/lattice';
import { formatNumber } from './format';

const parts: [RegExp, (n: number) => string][] = [
  [/^\.window\.from$/, () => 'window opens'],
  [/^\.window\.to$/, () => 'window closes'],
  [/^\.window\.at$/, () => 'date'],
  [/^\.window\.dates\[(\d+)\]$/, (n) => `date ${n + 1}`],
  [/^\.payments\[(\d+)\]\.window\.at$/, (n) => `payment ${n + 1}`],
  [/^\.backCost\.window\.from$/, () => 'restart window opens'],
  [/^\.backCost\.window\.to$/, () => 'restart window closes'],
];

/** “Sell the plant” window closes, for options[1].window.to; the field itself when it is not a right's. */
function dateName(field: string, rightNames: string[]): string {
  const payout = /^underlying\.payouts\[(\d+)\]\.at$/.exec(field);
  if (payout) return `payout ${Number(payout[1]) + 1}`;
  const option = /^options\[(\d+)\](.*)$/.exec(field);
  if (!option) return field;
  const name = rightNames[Number(option[1])] ?? `right ${Number(option[1]) + 1}`;
  for (const [pattern, words] of parts) {
    const match = pattern.exec(option[2]!);
    if (match) return `“${name}” ${words(Number(match[1] ?? 0))}`;
  }
  return `“${name}” ${option[2]!.replace(/^\./, '')}`;
}

/** The moved dates in one sentence, or null when every date is on a step; rightNames in the model's order. */
export function describeSnaps(snaps: Snap[], rightNames: string[]): string | null {
  if (snaps.length === 0) return null;
  const moves = snaps.map((s) => `${dateName(s.field, rightNames)}: year ${formatNumber(s.requested, 3)} → ${formatNumber(s.used, 3)}`).join('; ');
  return `Dates moved onto the lattice's steps (a single date to the nearest step, a window to the steps inside it): ${moves}.`;
}
