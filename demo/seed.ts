/**
 * Seeds the demo organisations and users, idempotently: running it twice changes nothing.
 * Users are created verified, with the demo password, through better-auth's own password
 * hashing so they sign in like anyone else.
 */
import { randomUUID } from 'node:crypto';
import { db } from '@/db';
import { auth } from '@/lib/auth';
import { DEMO_PASSWORD, demoOrganisations } from './organisations';
import { seedPortfolio } from './seed-portfolio';

export async function seedDemo(): Promise<{ created: string[] }> {
  const ctx = await auth.$context;
  const created: string[] = [];
  for (const org of demoOrganisations) {
    let orgRow = await db.selectFrom('organization').select('id').where('slug', '=', org.slug).executeTakeFirst();
    if (!orgRow) {
      orgRow = await db
        .insertInto('organization')
        .values({ id: randomUUID(), name: org.name, slug: org.slug, createdAt: new Date(), logo: null, metadata: JSON.stringify({ demo: true }) })
        .returning('id')
        .executeTakeFirstOrThrow();
      await db
        .insertInto('organization_settings')
        .values({
          organization_id: orgRow.id,
          currency: org.settings.currency,
          risk_free_rate: org.settings.riskFreeRate,
          wacc: org.settings.wacc,
          fiscal_year_start_month: org.settings.fiscalYearStartMonth,
        })
        .onConflict((c) => c.doNothing())
        .execute();
      created.push(org.name);
    }
    for (const person of org.users) {
      let user = await db.selectFrom('user').select('id').where('email', '=', person.email).executeTakeFirst();
      if (!user) {
        const made = await ctx.internalAdapter.createUser({ email: person.email, name: person.name, emailVerified: true }, { method: 'admin' });
        await ctx.internalAdapter.linkAccount({
          userId: made.id,
          providerId: 'credential',
          accountId: made.id,
          password: await ctx.password.hash(DEMO_PASSWORD),
        });
        user = { id: made.id };
        created.push(person.email);
      }
      const membership = await db.selectFrom('member').select('id').where('organizationId', '=', orgRow.id).where('userId', '=', user.id).executeTakeFirst();
      if (!membership)
        await db
          .insertInto('member')
          .values({ id: randomUUID(), organizationId: orgRow.id, userId: user.id, role: person.role, createdAt: new Date() })
          .execute();
    }
    if (org.portfolioBy) {
      const idOf = async (email: string) => (await db.selectFrom('user').select('id').where('email', '=', email).executeTakeFirstOrThrow()).id;
      created.push(
        ...(await seedPortfolio({
          orgId: orgRow.id,
          analystId: await idOf(org.portfolioBy),
          reviewerId: org.reviewedBy ? await idOf(org.reviewedBy) : undefined,
          currency: org.settings.currency,
        })),
      );
    }
  }
  return { created };
}
