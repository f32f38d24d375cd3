/**
 * The review workflow: a case's status (draft → in review → approved or returned), immutable
 * snapshots frozen at submission (the exact case inputs, engine input, result, engine version and
 * input hash; only the decision columns are ever written after), comments attached to a section
 * of a case, and board packs rendered once per approved snapshot and page size.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await sql`update "case" set status = 'draft' where status not in ('draft', 'in_review', 'approved', 'returned')`.execute(db);
  await db.schema
    .alterTable('case')
    .addCheckConstraint('case_status', sql`status in ('draft', 'in_review', 'approved', 'returned')`)
    .execute();

  await db.schema
    .createTable('case_snapshot')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('case_version', 'integer', (c) => c.notNull())
    .addColumn('case_name', 'text', (c) => c.notNull())
    .addColumn('inputs', 'jsonb', (c) => c.notNull())
    .addColumn('model', 'jsonb', (c) => c.notNull())
    .addColumn('result', 'jsonb', (c) => c.notNull())
    .addColumn('engine_version', 'text', (c) => c.notNull())
    .addColumn('input_hash', 'text', (c) => c.notNull())
    .addColumn('submitted_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('submitted_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('in_review'))
    .addColumn('decided_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('decided_at', 'timestamptz')
    .addColumn('decision_reason', 'text')
    .addCheckConstraint('case_snapshot_status', sql`status in ('in_review', 'approved', 'returned')`)
    .execute();
  await db.schema.createIndex('case_snapshot_case_idx').on('case_snapshot').columns(['organization_id', 'case_id', 'submitted_at']).execute();

  await db.schema
    .createTable('review_comment')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('snapshot_id', 'text', (c) => c.references('case_snapshot.id').onDelete('set null'))
    .addColumn('section', 'text', (c) => c.notNull())
    .addColumn('body', 'text', (c) => c.notNull())
    .addColumn('author_id', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('review_comment_case_idx').on('review_comment').columns(['organization_id', 'case_id', 'created_at']).execute();

  await db.schema
    .createTable('board_pack')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('snapshot_id', 'text', (c) => c.notNull().references('case_snapshot.id').onDelete('cascade'))
    .addColumn('page_size', 'text', (c) => c.notNull())
    .addColumn('pdf', 'bytea', (c) => c.notNull())
    .addColumn('sha256', 'text', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('board_pack_page_size', sql`page_size in ('A4', 'LETTER')`)
    .addUniqueConstraint('board_pack_snapshot_size', ['snapshot_id', 'page_size'])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('board_pack').ifExists().execute();
  await db.schema.dropTable('review_comment').ifExists().execute();
  await db.schema.dropTable('case_snapshot').ifExists().execute();
  await db.schema.alterTable('case').dropConstraint('case_status').execute();
}
