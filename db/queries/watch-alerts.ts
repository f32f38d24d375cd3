/** The last standing of each followed right, and the alerts announcing a change in it. */
import { sql } from 'kysely';
import type { Database } from '../index';
import type { WatchAlertKind } from '../types';

/** The standings last seen for the rights of a followed version, by right id. */
export async function listStandings(db: Database, { snapshotId }: { snapshotId: string }): Promise<Map<string, string>> {
  const rows = await db.selectFrom('right_standing').select(['right_id', 'status']).where('snapshot_id', '=', snapshotId).execute();
  return new Map(rows.map((r) => [r.right_id, r.status]));
}

export async function saveStandings(
  db: Database,
  { snapshotId, asOf, rights }: { snapshotId: string; asOf: string; rights: { id: string; status: string }[] },
) {
  if (rights.length === 0) return;
  await db
    .insertInto('right_standing')
    .values(rights.map((r) => ({ snapshot_id: snapshotId, right_id: r.id, status: r.status, as_of: asOf })))
    .onConflict((c) =>
      c
        .columns(['snapshot_id', 'right_id'])
        .doUpdateSet((eb) => ({ status: eb.ref('excluded.status'), as_of: eb.ref('excluded.as_of'), updated_at: new Date() })),
    )
    .execute();
}

/**
 * Records an alert unless the same change was announced already (the unique key on version,
 * right, kind and change): the id when it is new, null when it was not.
 */
export async function addAlert(
  db: Database,
  args: { orgId: string; caseId: string; snapshotId: string; rightId: string; kind: WatchAlertKind; changeKey: string; message: string; asOf: string },
): Promise<string | null> {
  const row = await db
    .insertInto('watch_alert')
    .values({
      organization_id: args.orgId,
      case_id: args.caseId,
      snapshot_id: args.snapshotId,
      right_id: args.rightId,
      kind: args.kind,
      change_key: args.changeKey,
      message: args.message,
      as_of: args.asOf,
    })
    .onConflict((c) => c.columns(['snapshot_id', 'right_id', 'kind', 'change_key']).doNothing())
    .returning('id')
    .executeTakeFirst();
  return row?.id ?? null;
}

/** The organisation's alerts, newest first, with their case and project; optionally one case's. */
export async function listAlerts(db: Database, { orgId, caseId, limit = 200 }: { orgId: string; caseId?: string; limit?: number }) {
  let query = db
    .selectFrom('watch_alert')
    .innerJoin('case', 'case.id', 'watch_alert.case_id')
    .innerJoin('project', 'project.id', 'case.project_id')
    .select([
      'watch_alert.id',
      'watch_alert.kind',
      'watch_alert.right_id as rightId',
      'watch_alert.message',
      sql<string>`watch_alert.as_of::text`.as('asOf'),
      'watch_alert.created_at as createdAt',
      'case.id as caseId',
      'case.name as caseName',
      'project.id as projectId',
      'project.name as projectName',
    ])
    .where('watch_alert.organization_id', '=', orgId);
  if (caseId) query = query.where('watch_alert.case_id', '=', caseId);
  return query.orderBy('watch_alert.created_at', 'desc').limit(limit).execute();
}

/** Who hears of a followed case's alerts: its analyst (who created it) and the organisation's reviewers. */
export async function alertRecipients(db: Database, { orgId, caseId }: { orgId: string; caseId: string }): Promise<string[]> {
  const rows = await db
    .selectFrom('member')
    .innerJoin('user', 'user.id', 'member.userId')
    .select('user.email')
    .where('member.organizationId', '=', orgId)
    .where((eb) =>
      eb.or([
        eb('member.role', '=', 'reviewer'),
        eb('member.userId', 'in', eb.selectFrom('case').select('case.created_by').where('case.id', '=', caseId).where('case.organization_id', '=', orgId)),
      ]),
    )
    .execute();
  return [...new Set(rows.map((r) => r.email))];
}
