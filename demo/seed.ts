/**
 * Seeds the demo organisations and users, idempotently: running it twice changes nothing.
 * Users are created verified, with the demo password, through better-auth's own password
 * hashing so they sign in like anyone else.
 */
import { db } from '@/db';
import { addDemoOrganisation, ensureMembership, findOrganisationIdBySlug, findUserIdByEmail } from '@/db/queries/demo';
import { auth } from '@/lib/auth';
import { DEMO_PASSWORD, demoOrganisations } from './organisations';
import { seedPortfolio } from './seed-portfolio';

export async function seedDemo(): Promise<{ created: string[] }> {
  const ctx = await auth.$context;
  const created: string[] = [];
  for (const org of demoOrganisations) {
    let orgId = await findOrganisationIdBySlug(db, { slug: org.slug });
    if (!orgId) {
      orgId = await addDemoOrganisation(db, { name: org.name, slug: org.slug, settings: org.settings });
      created.push(org.name);
    }
    for (const person of org.users) {
      let userId = await findUserIdByEmail(db, { email: person.email });
      if (!userId) {
        const made = await ctx.internalAdapter.createUser({ email: person.email, name: person.name, emailVerified: true }, { method: 'admin' });
        await ctx.internalAdapter.linkAccount({
          userId: made.id,
          providerId: 'credential',
          accountId: made.id,
          password: await ctx.password.hash(DEMO_PASSWORD),
        });
        userId = made.id;
        created.push(person.email);
      }
      await ensureMembership(db, { orgId, userId, role: person.role });
    }
    if (org.portfolioBy) {
      const idOf = async (email: string) => {
        const id = await findUserIdByEmail(db, { email });
        if (!id) throw new Error(`seed: no user ${email}`);
        return id;
      };
      created.push(
        ...(await seedPortfolio({
          orgId,
          analystId: await idOf(org.portfolioBy),
          reviewerId: org.reviewedBy ? await idOf(org.reviewedBy) : undefined,
          currency: org.settings.currency,
        })),
      );
    }
  }
  return { created };
}
