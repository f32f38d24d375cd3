/**
 * The demo's follow-through (invented figures, labelled): the approved demo plant's history lies
 * in the past — built, submitted and approved `approvedDaysAgo` days ago, the project, its cases,
 * runs, snapshots and audit entries together, so every page tells the same story — and the team
 * has recorded the plant's value since. The last value is placed, from the approved run's own
 * boundary, within one standard deviation of a right's critical value (on the side where it is
 * not used yet): a new user finds a right near its boundary, and the check queued here (run by
 * the worker) sends its one alert.
 */
import { db } from '@/db';
import { dateProjectRecords } from '@/db/queries/demo';
import { addObservation } from '@/db/queries/observations';
import { latestApprovedSnapshot } from '@/db/queries/reviews';
import type { ProjectModel } from '@/lattice';
import { enqueue } from '@/lib/jobs/enqueue';
import { QUEUES } from '@/lib/jobs/queues';
import { dateOf, yearsBetween } from '@/lib/watch/dates';
import { rightStatuses } from '@/lib/watch/status';
import { readStoredResult } from '@/lattice';

export interface DemoFollow {
  approvedDaysAgo: number;
  /** Earlier values, as multiples of V at approval. */
  observations: { daysAgo: number; ofApproved: number; note: string; source: string }[];
  /** The latest value: `sd` standard deviations of a year's move above (or below) this right's boundary. */
  near: { right: string; daysAgo: number; sd: number; note: string; source: string };
}

const daysBefore = (days: number) => new Date(Date.now() - days * 86_400_000);

/**
 * When the followed project's history happened: built and valued three days before its
 * approval, submitted the day before. Snapshots and audit entries are written with these times
 * (they are append-only, never changed later); the project, cases and runs are dated after.
 */
export function historyOf(follow: DemoFollow) {
  return { built: daysBefore(follow.approvedDaysAgo + 3), submitted: daysBefore(follow.approvedDaysAgo + 1), approved: daysBefore(follow.approvedDaysAgo) };
}

export async function seedFollow(args: { orgId: string; analystId: string; projectId: string; caseId: string; follow: DemoFollow }) {
  const { follow } = args;
  await db.transaction().execute((trx) => dateProjectRecords(trx, { projectId: args.projectId, built: historyOf(follow).built }));
  const snapshot = await latestApprovedSnapshot(db, { orgId: args.orgId, caseId: args.caseId });
  if (!snapshot) throw new Error('seed: the followed case has no approved version');
  const model = snapshot.model as ProjectModel;
  const result = readStoredResult(snapshot.result);
  const approvedOn = dateOf(snapshot.decided_at!);
  const rows = follow.observations.map((o) => ({ ...o, value: model.underlying.value * o.ofApproved }));
  // Where the right's boundary stands today, from the approved run (lib/watch/status.ts).
  const today = dateOf(new Date());
  const t = yearsBetween(approvedOn, today);
  const probe = rightStatuses({
    options: model.options ?? [],
    rights: result.rights,
    horizon: model.horizon,
    volatility: model.underlying.volatility,
    t,
    value: model.underlying.value,
  });
  const critical = probe.find((r) => r.id === follow.near.right)?.critical;
  if (!critical) throw new Error(`seed: “${follow.near.right}” has no boundary ${follow.approvedDaysAgo} days after approval to place the demo's value near`);
  const value = Math.round(critical * Math.exp(follow.near.sd * model.underlying.volatility) * 10) / 10;
  rows.push({ ...follow.near, ofApproved: value / model.underlying.value, value });
  await db.transaction().execute(async (trx) => {
    for (const o of rows)
      await addObservation(trx, {
        orgId: args.orgId,
        caseId: args.caseId,
        observedOn: dateOf(daysBefore(o.daysAgo)),
        value: o.value,
        note: o.note,
        source: o.source,
        recordedBy: args.analystId,
      });
    // The worker checks the case on its first run and sends the alert of the right near its boundary.
    await enqueue(QUEUES.watchCheck, { orgId: args.orgId, caseId: args.caseId }, { executor: trx });
  });
}
