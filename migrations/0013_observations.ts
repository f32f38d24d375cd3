/**
 * Following a decision: dated observations of a case's project value V after its approval, each
 * with a note and a source, recorded by a member. The approved snapshot is the model followed.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('case_observation')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('case_id', 'text', (c) => c.notNull().references('case.id').onDelete('cascade'))
    .addColumn('observed_on', 'date', (c) => c.notNull())
    .addColumn('value', 'double precision', (c) => c.notNull())
    .addColumn('note', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('source', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('recorded_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('case_observation_value_positive', sql`value > 0`)
    .execute();
  await db.schema.createIndex('case_observation_case_idx').on('case_observation').columns(['case_id', 'observed_on']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('case_observation').ifExists().execute();
}
