/**
 * What changed in a followed case's standing since the last check, as alerts: a right newly in
 * its region or near its boundary, a window newly open, a window closing within the
 * organisation's notice. Each change has a key, so announcing it again is recognised and
 * refused (lib/watch/alerts.ts keeps them unique). Pure: the check feeds it.
 */
import type { WatchAlertKind } from '@/db/types';
import { formatMoney } from '../format';
import { daysBetween } from './dates';
import type { RightStatus, RightWatch } from './status';

export interface Change {
  rightId: string;
  kind: WatchAlertKind;
  changeKey: string;
  /** A few words for a subject line. */
  headline: string;
  message: string;
}

type DatedRight = Omit<RightWatch, 'windowOpensAt' | 'windowClosesAt'> & { windowOpensAt: string | null; windowClosesAt: string | null };

const openStatuses: RightStatus[] = ['in_region', 'near', 'outside'];

export function changesOf(args: {
  rights: DatedRight[];
  /** The status each right had at the last check, by id (none before the first). */
  before: Map<string, string>;
  asOf: string;
  today: string;
  value: number;
  valueOn: string;
  daysBeforeClose: number;
  currency: string;
}): Change[] {
  const { rights, before, asOf, today, daysBeforeClose, currency } = args;
  const v = `V = ${formatMoney(args.value, currency)} (observed ${args.valueOn})`;
  const changes: Change[] = [];
  for (const r of rights) {
    const was = before.get(r.id);
    const critical = r.critical === null ? '' : `, critical value ${formatMoney(r.critical, currency)}`;
    if (r.status === 'in_region' && was !== 'in_region')
      changes.push({
        rightId: r.id,
        kind: 'in_region',
        changeKey: `${was ?? 'approval'}→in_region ${asOf}`,
        headline: `use “${r.name}” now`,
        message: `“${r.name}”: the model says use it now. ${v}${critical}.`,
      });
    if (r.status === 'near' && was !== 'near')
      changes.push({
        rightId: r.id,
        kind: 'near',
        changeKey: `${was ?? 'approval'}→near ${asOf}`,
        headline: `“${r.name}” near its boundary`,
        message: `“${r.name}” is near its boundary, within one standard deviation of a year's move. ${v}${critical}.`,
      });
    if (was === 'window_not_open' && openStatuses.includes(r.status))
      changes.push({
        rightId: r.id,
        kind: 'window_opened',
        changeKey: `opened ${r.windowOpensAt ?? asOf}`,
        headline: `“${r.name}” window open`,
        message: `“${r.name}” can be used from now: its window opened on ${r.windowOpensAt ?? asOf}.`,
      });
    const left = r.windowClosesAt === null ? null : daysBetween(today, r.windowClosesAt);
    if (openStatuses.includes(r.status) && left !== null && left >= 0 && left <= daysBeforeClose)
      changes.push({
        rightId: r.id,
        kind: 'window_closing',
        changeKey: `closes ${r.windowClosesAt}`,
        headline: `“${r.name}” window closing`,
        message: `“${r.name}”: its window closes on ${r.windowClosesAt}, in ${left} day${left === 1 ? '' : 's'}.`,
      });
  }
  return changes;
}
