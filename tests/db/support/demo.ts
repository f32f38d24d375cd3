/** The seeded demo organisations and people the database tests act as, and a minimal valid case. */
import { db } from '@/db';
import { seedDemo } from '@/demo/seed';

export async function seededDemo() {
  await seedDemo();
  const orgId = async (slug: string) => (await db.selectFrom('organization').select('id').where('slug', '=', slug).executeTakeFirstOrThrow()).id;
  const userId = async (email: string) => (await db.selectFrom('user').select('id').where('email', '=', email).executeTakeFirstOrThrow()).id;
  return {
    kestrel: await orgId('kestrel-bay-materials'),
    harrow: await orgId('harrow-fen-logistics'),
    analyst: await userId('analyst@kestrelbay.example'),
    reviewer: await userId('reviewer@kestrelbay.example'),
  };
}

/** A one-year case with no options: enough for the data layer, which never values it. */
export const minimalCase = {
  name: 'Base',
  cashFlows: { wacc: 0.08, rows: [{ year: 0, revenue: 10, operatingCost: 0, capex: 0, tax: 0, workingCapital: 0 }] },
  settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 10 },
  options: [],
};
