/**
 * Following a decision, continued: the decisions the team records on an approved right
 * (exercised, declined, postponed), the last standing of each followed right (so an alert is
 * sent once per change), the alerts themselves, and how many days before a window closes the
 * organisation wants to hear of it. Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('right_decision')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('snapshot_id', 'text', (c) => c.notNull().references('case_snapshot.id').onDelete('cascade'))
    .addColumn('right_id', 'text', (c) => c.notNull())
    .addColumn('decision', 'text', (c) => c.notNull())
    .addColumn('decided_on', 'date', (c) => c.notNull())
    .addColumn('reason', 'text', (c) => c.notNull())
    .addColumn('recorded_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('right_decision_kind', sql`decision in ('exercised', 'declined', 'postponed')`)
    .execute();
  await db.schema.createIndex('right_decision_case_idx').on('right_decision').columns(['case_id', 'decided_on']).execute();
  // A right is used or given up once: a second final decision on it is refused by the database too.
  await db.schema
    .createIndex('right_decision_final_once')
    .on('right_decision')
    .columns(['snapshot_id', 'right_id'])
    .unique()
    .where(sql.ref('decision'), '<>', 'postponed')
    .execute();

  await db.schema
    .createTable('right_standing')
    .addColumn('snapshot_id', 'text', (c) => c.notNull().references('case_snapshot.id').onDelete('cascade'))
    .addColumn('right_id', 'text', (c) => c.notNull())
    .addColumn('status', 'text', (c) => c.notNull())
    .addColumn('as_of', 'date', (c) => c.notNull())
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint('right_standing_pk', ['snapshot_id', 'right_id'])
    .execute();

  await db.schema
    .createTable('watch_alert')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('snapshot_id', 'text', (c) => c.notNull().references('case_snapshot.id').onDelete('cascade'))
    .addColumn('right_id', 'text', (c) => c.notNull())
    .addColumn('kind', 'text', (c) => c.notNull())
    // What makes this change this one and no other (a status reached on a date, a window's date).
    .addColumn('change_key', 'text', (c) => c.notNull())
    .addColumn('message', 'text', (c) => c.notNull())
    .addColumn('as_of', 'date', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('watch_alert_kind', sql`kind in ('in_region', 'near', 'window_opened', 'window_closing')`)
    .addUniqueConstraint('watch_alert_once', ['snapshot_id', 'right_id', 'kind', 'change_key'])
    .execute();
  await db.schema.createIndex('watch_alert_org_idx').on('watch_alert').columns(['organization_id', 'created_at']).execute();

  await db.schema
    .alterTable('organization_settings')
    .addColumn('alert_days_before_close', 'integer', (c) => c.notNull().defaultTo(30))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('organization_settings').dropColumn('alert_days_before_close').execute();
  await db.schema.dropTable('watch_alert').ifExists().execute();
  await db.schema.dropTable('right_standing').ifExists().execute();
  await db.schema.dropTable('right_decision').ifExists().execute();
}
