/**
 * The analyst's recommendation to the committee, written at submission and frozen with the
 * snapshot (the board pack prints it; Leeway's own reading of the figures is shown beside it as a
 * suggestion, never as the recommendation). Older snapshots have none. The frozen-snapshot trigger
 * (0007, widened by 0008) now guards this column too.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

const frozen = [
  'id',
  'organization_id',
  'case_id',
  'case_version',
  'case_name',
  'inputs',
  'model',
  'result',
  'engine_version',
  'input_hash',
  'submitted_by',
  'submitted_at',
  'project_name',
  'project_description',
  'currency',
  'organization_name',
  'organization_is_demo',
  'submitted_by_name',
];

async function decisionTrigger(db: Kysely<any>, columns: string[]) {
  const row = (name: 'new' | 'old') => columns.map((c) => `${name}.${c}`).join(', ');
  await sql
    .raw(
      `create or replace function leeway_snapshot_decision_only() returns trigger language plpgsql as $$
    begin
      if old.status = 'in_review' and new.status in ('approved', 'returned', 'withdrawn')
         and (${row('new')}) is not distinct from (${row('old')}) then
        return new;
      end if;
      raise exception 'case_snapshot rows are frozen: only the decision on a snapshot in review may be written'
        using errcode = 'insufficient_privilege';
    end $$`,
    )
    .execute(db);
}

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('case_snapshot').addColumn('recommendation', 'text').execute();
  await decisionTrigger(db, [...frozen, 'recommendation']);
}

export async function down(db: Kysely<any>): Promise<void> {
  await decisionTrigger(db, frozen);
  await db.schema.alterTable('case_snapshot').dropColumn('recommendation').execute();
}
