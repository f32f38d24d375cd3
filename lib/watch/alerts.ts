/**
 * Alerts of a followed case: when a check (after an observation or a decision, and once a day)
 * finds a right newly in its region or near its boundary, its window newly open, or its window
 * closing within the organisation's notice (30 days by default), Leeway records the change once
 * and e-mails the case's analyst and the organisation's reviewers. A change is announced once:
 * the last standing of every right is kept, and each alert has a unique key (the version, the
 * right, the kind and what changed), so two checks racing each other send one message.
 */
import 'server-only';
import { db } from '@/db';
import { findSettings } from '@/db/queries/settings';
import { addAlert, alertRecipients, listAlerts, listStandings, saveStandings } from '@/db/queries/watch-alerts';
import type { Member } from '../dal';
import { env } from '../env';
import { linkMail, queueMail } from '../mail';
import { dateOf } from './dates';
import { loadFollowed, readWatch } from './follow';
import { changesOf } from './changes';

export type { WatchAlertKind } from '@/db/types';

/** The organisation's alerts, newest first (the Alerts page). */
export async function listOrganisationAlerts(member: Member) {
  return listAlerts(db, { orgId: member.orgId });
}

/** Checks one followed case on `today` and announces what changed; returns the alerts recorded. */
export async function checkFollowedCase(orgId: string, caseId: string, today = dateOf(new Date())): Promise<{ alerts: number }> {
  const f = await loadFollowed(orgId, caseId);
  const [watch, settings, before] = await Promise.all([
    readWatch(f, { owner: `watch-check:${orgId}` }, today),
    findSettings(db, { orgId }),
    listStandings(db, { snapshotId: f.snapshot.id }),
  ]);
  const changes = changesOf({ ...watch, before, today, daysBeforeClose: settings.alert_days_before_close, currency: f.snapshot.currency ?? '' });
  const url = `${env.APP_URL}/projects/${f.projectId}/cases/${caseId}?tab=watch`;
  return db.transaction().execute(async (trx) => {
    let alerts = 0;
    const to = changes.length > 0 ? await alertRecipients(trx, { orgId, caseId }) : [];
    for (const c of changes) {
      const id = await addAlert(trx, {
        orgId,
        caseId,
        snapshotId: f.snapshot.id,
        rightId: c.rightId,
        kind: c.kind,
        changeKey: c.changeKey,
        message: c.message,
        asOf: watch.asOf,
      });
      if (!id) continue;
      alerts++;
      // In the transaction that records the alert: the mail exists exactly when the alert does.
      for (const email of to)
        await queueMail(
          linkMail(email, `Follow-through: ${f.snapshot.project_name ?? ''} — ${f.snapshot.case_name}: ${c.headline}`, c.message, 'Open the Watch tab', url),
          trx,
        );
    }
    await saveStandings(trx, { snapshotId: f.snapshot.id, asOf: watch.asOf, rights: watch.rights });
    return { alerts };
  });
}
