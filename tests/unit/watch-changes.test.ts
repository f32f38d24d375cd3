/**
 * What a check announces (lib/watch/changes.ts), on hand-built standings: a status reached is
 * announced once (the same standing again is no change), a window opening only when it was seen
 * shut, a window closing only within the organisation's notice, and each change carries a key
 * that a repeat of the same change reproduces (the database keeps the keys unique). Invented
 * figures.
 */
import { describe, expect, it } from 'vitest';
import { changesOf } from '@/lib/watch/changes';
import type { RightStatus } from '@/lib/watch/status';

const right = (id: string, status: RightStatus, windowOpensAt: string | null = '2026-01-01', windowClosesAt: string | null = '2030-01-01') => ({
  id,
  name: id,
  status,
  critical: 120,
  side: 'above' as const,
  distanceRatio: 0.1,
  distanceSd: 0.3,
  windowOpensAt,
  windowClosesAt,
});
const base = { asOf: '2026-12-02', today: '2026-12-02', value: 110, valueOn: '2026-11-20', daysBeforeClose: 30, currency: 'EUR' };

describe('what a check of a followed case announces', () => {
  it('announces a right reaching its region or its boundary once, and nothing for the same standing again', () => {
    const rights = [right('Expand', 'in_region'), right('Sell', 'near'), right('Shrink', 'outside')];
    const first = changesOf({ ...base, rights, before: new Map() });
    expect(first.map((c) => [c.rightId, c.kind])).toEqual([
      ['Expand', 'in_region'],
      ['Sell', 'near'],
    ]);
    expect(first[0]!.message).toContain('EUR 110.0');
    const again = changesOf({ ...base, rights, before: new Map(rights.map((r) => [r.id, r.status])) });
    expect(again).toEqual([]);
    // The same check run twice before either is saved gives the same keys: the second insert is refused.
    expect(changesOf({ ...base, rights, before: new Map() }).map((c) => c.changeKey)).toEqual(first.map((c) => c.changeKey));
  });

  it('announces a move back to the boundary after leaving it as a new change', () => {
    const near = [right('Sell', 'near')];
    const first = changesOf({ ...base, rights: near, before: new Map() });
    const later = changesOf({ ...base, asOf: '2027-01-10', today: '2027-01-10', rights: near, before: new Map([['Sell', 'outside']]) });
    expect(later.map((c) => c.kind)).toEqual(['near']);
    expect(later[0]!.changeKey).not.toBe(first[0]!.changeKey);
  });

  it('announces a window opening only when it was seen shut, and a closing only within the notice', () => {
    const opened = changesOf({ ...base, rights: [right('Phase 2', 'outside', '2026-12-01')], before: new Map([['Phase 2', 'window_not_open']]) });
    expect(opened.map((c) => [c.kind, c.changeKey])).toEqual([['window_opened', 'opened 2026-12-01']]);
    expect(changesOf({ ...base, rights: [right('Phase 2', 'outside', '2026-12-01')], before: new Map([['Phase 2', 'outside']]) })).toEqual([]);
    const closing = (closes: string, days = 30) =>
      changesOf({ ...base, daysBeforeClose: days, rights: [right('Sell', 'outside', '2026-01-01', closes)], before: new Map([['Sell', 'outside']]) }).map(
        (c) => c.kind,
      );
    expect(closing('2027-01-01')).toEqual(['window_closing']); // 30 days
    expect(closing('2027-01-02')).toEqual([]); // 31 days
    expect(closing('2027-01-02', 31)).toEqual(['window_closing']);
    expect(closing('2026-12-01')).toEqual([]); // already closed
    // A right that can no longer be used has no window to announce.
    expect(changesOf({ ...base, rights: [right('Sell', 'exercised', '2026-01-01', '2026-12-20')], before: new Map() })).toEqual([]);
  });
});
