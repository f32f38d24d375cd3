/**
 * What the lattice did to dates between its steps, in words for the Results tab and the
 * validation report: a single date moves to the nearest step, an American window keeps the steps
 * inside it (docs/engine.md §2).
 */
import type { Snap } from '@/lattice';
import { formatNumber } from './format';

export function describeSnaps(snaps: Snap[]): string | null {
  if (snaps.length === 0) return null;
  const moves = snaps.map((s) => `${s.field} from ${formatNumber(s.requested, 3)} to ${formatNumber(s.used, 3)}`).join('; ');
  return `Dates moved onto the lattice's steps (a single date to the nearest step, a window to the steps inside it): ${moves}.`;
}
