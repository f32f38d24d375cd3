/**
 * The demo seed's own queries (demo/): finding what an earlier seed made, making the invented
 * organisations and memberships, and dating a followed project's records in its invented past.
 * Nothing in the app calls these.
 */
import { randomUUID } from 'node:crypto';
import { sql } from 'kysely';
import type { Database } from '../index';

export async function findOrganisationIdBySlug(db: Database, { slug }: { slug: string }): Promise<string | undefined> {
  return (await db.selectFrom('organization').select('id').where('slug', '=', slug).executeTakeFirst())?.id;
}

/** An invented organisation, marked as demo, with its default settings. */
export async function addDemoOrganisation(
  db: Database,
  args: { name: string; slug: string; settings: { currency: string; riskFreeRate: number; wacc: number; fiscalYearStartMonth: number } },
): Promise<string> {
  const { id } = await db
    .insertInto('organization')
    .values({ id: randomUUID(), name: args.name, slug: args.slug, createdAt: new Date(), logo: null, metadata: JSON.stringify({ demo: true }) })
    .returning('id')
    .executeTakeFirstOrThrow();
  await db
    .insertInto('organization_settings')
    .values({
      organization_id: id,
      currency: args.settings.currency,
      risk_free_rate: args.settings.riskFreeRate,
      wacc: args.settings.wacc,
      fiscal_year_start_month: args.settings.fiscalYearStartMonth,
    })
    .onConflict((c) => c.doNothing())
    .execute();
  return id;
}

export async function findUserIdByEmail(db: Database, { email }: { email: string }): Promise<string | undefined> {
  return (await db.selectFrom('user').select('id').where('email', '=', email).executeTakeFirst())?.id;
}

/** Makes the user a member in the role unless they already are one (in whatever role). */
export async function ensureMembership(db: Database, { orgId, userId, role }: { orgId: string; userId: string; role: string }): Promise<void> {
  const membership = await db.selectFrom('member').select('id').where('organizationId', '=', orgId).where('userId', '=', userId).executeTakeFirst();
  if (!membership) await db.insertInto('member').values({ id: randomUUID(), organizationId: orgId, userId, role, createdAt: new Date() }).execute();
}

/**
 * Dates the project, its cases and their runs from `built`, as if they had been made then. Each
 * record keeps its distance from the project's first case, so the order they were made in stays:
 * the first case is the project's base case (db/queries/summaries.ts), and with one date for all
 * the base case was whichever the database listed first.
 */
export async function dateProjectRecords(trx: Database, { projectId, built }: { projectId: string; built: Date }): Promise<void> {
  await trx.updateTable('project').set({ created_at: built, updated_at: built }).where('id', '=', projectId).execute();
  const caseIds = (await trx.selectFrom('case').select('id').where('project_id', '=', projectId).execute()).map((c) => c.id);
  if (caseIds.length === 0) return;
  const first = sql<Date>`(select min(created_at) from "case" where project_id = ${projectId})`;
  const moved = sql<Date>`${built}::timestamptz + (created_at - ${first})`;
  await trx.updateTable('valuation_run').set({ created_at: moved }).where('case_id', 'in', caseIds).execute();
  await trx.updateTable('case').set({ created_at: moved, updated_at: moved }).where('id', 'in', caseIds).execute();
}
