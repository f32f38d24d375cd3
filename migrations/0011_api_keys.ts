/**
 * Organisation API keys. A key is stored as the SHA-256 of its secret (the secret is shown once
 * and never kept) with its first characters for recognition. Each key acts through a user row of
 * its own that has no password and no membership, so everything it does is attributed to
 * "API key <name> (created by …)" by the same joins that name people, and a reviewer key is a
 * different principal from the analyst key whose submission it decides.
 * Frozen in time: this file never imports application code.
 */
import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('api_key')
    .addColumn('id', 'text', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()::text`))
    .addColumn('organization_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('actor_id', 'text', (c) => c.notNull().unique().references('user.id').onDelete('cascade'))
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('role', 'text', (c) => c.notNull())
    .addColumn('prefix', 'text', (c) => c.notNull())
    .addColumn('secret_hash', 'text', (c) => c.notNull().unique())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('expires_at', 'timestamptz')
    .addColumn('last_used_at', 'timestamptz')
    .addColumn('revoked_at', 'timestamptz')
    .addCheckConstraint('api_key_role', sql`role in ('analyst', 'reviewer', 'viewer')`)
    .execute();
  await db.schema.createIndex('api_key_org_idx').on('api_key').columns(['organization_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('api_key').ifExists().execute();
}
