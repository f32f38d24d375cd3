/**
 * Safe by default:
 * - snapshots record the names a board pack prints (project, organisation, submitter, decider),
 *   captured at submission and decision, so renaming anything later never changes an approved
 *   pack; existing snapshots are filled from today's names once;
 * - four eyes: nobody decides on their own submission (checked for new decisions only);
 * - the audit log and the snapshots are append-only in the database itself: triggers refuse
 *   every delete and every update, except a snapshot's one decision (in review → approved or
 *   returned, frozen columns unchanged);
 * - failed sign-ins per account, for the backoff in lib/sign-in-backoff.ts.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('case_snapshot')
    .addColumn('project_name', 'text')
    .addColumn('project_description', 'text')
    .addColumn('currency', 'text')
    .addColumn('organization_name', 'text')
    .addColumn('organization_is_demo', 'boolean')
    .addColumn('submitted_by_name', 'text')
    .addColumn('decided_by_name', 'text')
    .execute();
  await sql`
    update case_snapshot s set
      project_name = p.name, project_description = p.description, currency = p.currency,
      organization_name = o.name, organization_is_demo = coalesce(o.metadata like '%"demo":true%', false),
      submitted_by_name = (select name from "user" where id = s.submitted_by),
      decided_by_name = (select name from "user" where id = s.decided_by)
    from "case" c join project p on p.id = c.project_id join organization o on o.id = c.organization_id
    where c.id = s.case_id`.execute(db);

  await sql`alter table case_snapshot add constraint case_snapshot_four_eyes
    check (decided_by is null or submitted_by is null or decided_by <> submitted_by) not valid`.execute(db);

  await sql`
    create function leeway_refuse_change() returns trigger language plpgsql as $$
    begin
      raise exception '% rows are append-only: % refused', tg_table_name, tg_op using errcode = 'insufficient_privilege';
    end $$`.execute(db);
  await sql`create trigger audit_log_append_only before update or delete on audit_log
    for each row execute function leeway_refuse_change()`.execute(db);
  await sql`create trigger case_snapshot_no_delete before delete on case_snapshot
    for each row execute function leeway_refuse_change()`.execute(db);
  await sql`
    create function leeway_snapshot_decision_only() returns trigger language plpgsql as $$
    begin
      if old.status = 'in_review' and new.status in ('approved', 'returned')
         and (new.id, new.organization_id, new.case_id, new.case_version, new.case_name, new.inputs, new.model,
              new.result, new.engine_version, new.input_hash, new.submitted_by, new.submitted_at,
              new.project_name, new.project_description, new.currency, new.organization_name,
              new.organization_is_demo, new.submitted_by_name)
         is not distinct from
             (old.id, old.organization_id, old.case_id, old.case_version, old.case_name, old.inputs, old.model,
              old.result, old.engine_version, old.input_hash, old.submitted_by, old.submitted_at,
              old.project_name, old.project_description, old.currency, old.organization_name,
              old.organization_is_demo, old.submitted_by_name) then
        return new;
      end if;
      raise exception 'case_snapshot rows are frozen: only the decision on a snapshot in review may be written'
        using errcode = 'insufficient_privilege';
    end $$`.execute(db);
  await sql`create trigger case_snapshot_decision_only before update on case_snapshot
    for each row execute function leeway_snapshot_decision_only()`.execute(db);

  await db.schema
    .createTable('sign_in_failure')
    .addColumn('email', 'text', (c) => c.primaryKey())
    .addColumn('failures', 'integer', (c) => c.notNull())
    .addColumn('last_failure_at', 'timestamptz', (c) => c.notNull())
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('sign_in_failure').ifExists().execute();
  await sql`drop trigger if exists case_snapshot_decision_only on case_snapshot`.execute(db);
  await sql`drop trigger if exists case_snapshot_no_delete on case_snapshot`.execute(db);
  await sql`drop trigger if exists audit_log_append_only on audit_log`.execute(db);
  await sql`drop function if exists leeway_snapshot_decision_only()`.execute(db);
  await sql`drop function if exists leeway_refuse_change()`.execute(db);
  await sql`alter table case_snapshot drop constraint if exists case_snapshot_four_eyes`.execute(db);
  await db.schema
    .alterTable('case_snapshot')
    .dropColumn('project_name')
    .dropColumn('project_description')
    .dropColumn('currency')
    .dropColumn('organization_name')
    .dropColumn('organization_is_demo')
    .dropColumn('submitted_by_name')
    .dropColumn('decided_by_name')
    .execute();
}
