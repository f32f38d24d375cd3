/** A right's standing and its alerts in words, the same on the case's Watch tab, the portfolio's watch list and the Alerts page. */
import type { WatchAlertKind } from '@/db/types';
import { formatNumber, formatPercent } from '../format';
import type { RightStatus } from './status';

export type AlertKind = WatchAlertKind;

export const alertKindWords: Record<AlertKind, string> = {
  in_region: 'Use it now',
  near: 'Near its boundary',
  window_opened: 'Window opened',
  window_closing: 'Window closing',
};

export const statusWords: Record<RightStatus, string> = {
  in_region: 'Use it now: in its region',
  near: 'Near its boundary (within 1 σ)',
  outside: 'Outside its region',
  window_not_open: 'Window not open yet',
  window_closed: 'Window closed',
  exercised: 'Exercised (recorded)',
  declined: 'Declined (recorded)',
};

/** How far V must move to reach the boundary: "+12.0 % (0.38 σ)", or "reached". */
export function distanceWords(r: { status: RightStatus; distanceRatio: number | null; distanceSd: number | null }): string {
  if (r.status === 'in_region') return 'reached';
  if (r.distanceRatio === null || r.distanceSd === null) return '–';
  return `${r.distanceRatio > 0 ? '+' : ''}${formatPercent(r.distanceRatio)} (${formatNumber(Math.abs(r.distanceSd), 2)} σ)`;
}
