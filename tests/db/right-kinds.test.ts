/**
 * Migration 0016 moves a case's rights to engine 4.0.0's shape (`kind`, and `mothball` for the
 * right to pause and restart) and back, keeping their order, their windows and the case's version.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { createCase } from '@/db/queries/cases';
import { createProject } from '@/db/queries/projects';
import { assertMigrated, migrator } from '@/db/migrator';
import { seedDemo } from '@/demo/seed';
import { caseInputSchema } from '@/lib/validations/case';

const window = { kind: 'american', from: 0, to: 4 };
const today = [
  { kind: 'expand', id: 'Phase 2', factor: 0.5, cost: 30, window },
  { kind: 'mothball', id: 'Pause', toScale: 0, cost: 1, backCost: 2, window },
  { kind: 'abandon', salvage: 40, window },
  { kind: 'mothball', id: 'switch-2', toScale: 0.5, cost: 1, backCost: 2, window },
];
// The same rights as engine 3.x wrote them.
const before = [
  { type: 'expand', id: 'Phase 2', factor: 0.5, cost: 30, window },
  { type: 'switch', id: 'Pause', toScale: 0, cost: 1, backCost: 2, window },
  { type: 'abandon', salvage: 40, window },
  { type: 'switch', toScale: 0.5, cost: 1, backCost: 2, window },
];

let caseId = '';
const stored = async () => db.selectFrom('case').select(['options', 'version']).where('id', '=', caseId).executeTakeFirstOrThrow();

beforeAll(async () => {
  await seedDemo();
  const org = await db.selectFrom('organization').select('id').where('slug', '=', 'kestrel-bay-materials').executeTakeFirstOrThrow();
  const user = await db.selectFrom('user').select('id').where('email', '=', 'analyst@kestrelbay.example').executeTakeFirstOrThrow();
  const project = await createProject(db, { orgId: org.id, ownerId: user.id, name: 'Migration plant', currency: 'EUR' });
  const content = caseInputSchema.parse({
    name: 'Three rights',
    cashFlows: { wacc: 0.08, rows: [{ year: 0, revenue: 0, operatingCost: 0, capex: 100, tax: 0, workingCapital: 0 }] },
    settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 50 },
  });
  // A case saved before 0016: its rights in 3.x's shape, which today's schema no longer takes.
  assertMigrated(await migrator(db).migrateDown());
  caseId = (await createCase(db, { orgId: org.id, projectId: project.id, createdBy: user.id, content: { ...content, options: before as never } }))!.id;
});

afterAll(async () => {
  assertMigrated(await migrator(db).migrateToLatest());
});

describe('migration 0016 (right kinds)', () => {
  it('writes today’s shape going up, in order, keeping an unnamed switch’s id, without a new case version', async () => {
    const { version } = await stored();
    expect((await stored()).options).toEqual(before);
    assertMigrated(await migrator(db).migrateToLatest());
    expect(await stored()).toEqual({ options: today, version });
    assertMigrated(await migrator(db).migrateDown());
    expect((await stored()).options).toEqual([...before.slice(0, 3), { ...before[3], id: 'switch-2' }]);
  });
});
