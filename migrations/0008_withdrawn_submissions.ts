/**
 * An analyst may withdraw their own submission while it waits for review: the snapshot stays
 * (append-only, as every snapshot) with the status `withdrawn` and the time, and the case goes
 * back to a draft. The frozen-snapshot trigger of 0007 is widened by exactly that one move.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

const frozenColumns = (row: 'new' | 'old') =>
  ['id', 'organization_id', 'case_id', 'case_version', 'case_name', 'inputs', 'model', 'result', 'engine_version', 'input_hash', 'submitted_by']
    .concat(['submitted_at', 'project_name', 'project_description', 'currency', 'organization_name', 'organization_is_demo', 'submitted_by_name'])
    .map((c) => `${row}.${c}`)
    .join(', ');

async function decisionTrigger(db: Kysely<any>, allowed: string[]) {
  await sql
    .raw(
      `create or replace function leeway_snapshot_decision_only() returns trigger language plpgsql as $$
    begin
      if old.status = 'in_review' and new.status in (${allowed.map((s) => `'${s}'`).join(', ')})
         and (${frozenColumns('new')}) is not distinct from (${frozenColumns('old')}) then
        return new;
      end if;
      raise exception 'case_snapshot rows are frozen: only the decision on a snapshot in review may be written'
        using errcode = 'insufficient_privilege';
    end $$`,
    )
    .execute(db);
}

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('case_snapshot').dropConstraint('case_snapshot_status').execute();
  await sql`alter table case_snapshot add constraint case_snapshot_status check (status in ('in_review', 'approved', 'returned', 'withdrawn'))`.execute(db);
  await decisionTrigger(db, ['approved', 'returned', 'withdrawn']);
}

export async function down(db: Kysely<any>): Promise<void> {
  await decisionTrigger(db, ['approved', 'returned']);
  await db.schema.alterTable('case_snapshot').dropConstraint('case_snapshot_status').execute();
  // Withdrawn snapshots cannot be changed or deleted (append-only), so older rows are not re-checked.
  await sql`alter table case_snapshot add constraint case_snapshot_status check (status in ('in_review', 'approved', 'returned')) not valid`.execute(db);
}
