/**
 * Projects and cases on a real PostgreSQL: scoped by organisation, duplicated independently,
 * and saved with optimistic concurrency — a stale save changes nothing, and of two saves based
 * on the same version exactly one wins.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { createCase, duplicateCase, findCase, saveCase } from '@/db/queries/cases';
import { createProject, findProject, listProjects } from '@/db/queries/projects';
import { seedDemo } from '@/demo/seed';
import { caseInputSchema } from '@/lib/validations/case';

let kestrel = '';
let harrow = '';
let analyst = '';

const content = caseInputSchema.parse({
  name: 'Base case',
  cashFlows: {
    wacc: 0.085,
    rows: [
      { year: 0, revenue: 0, operatingCost: 0, capex: 120, tax: 0, workingCapital: 0 },
      { year: 1, revenue: 90, operatingCost: 40, capex: 0, tax: 8, workingCapital: 2 },
    ],
  },
  settings: { volatility: 0.3, riskFreeRate: 0.03, steps: 100 },
  options: [{ kind: 'abandon', salvage: 60, window: { kind: 'american', from: 0, to: 1 } }],
});

beforeAll(async () => {
  await seedDemo();
  kestrel = (await db.selectFrom('organization').select('id').where('slug', '=', 'kestrel-bay-materials').executeTakeFirstOrThrow()).id;
  harrow = (await db.selectFrom('organization').select('id').where('slug', '=', 'harrow-fen-logistics').executeTakeFirstOrThrow()).id;
  analyst = (await db.selectFrom('user').select('id').where('email', '=', 'analyst@kestrelbay.example').executeTakeFirstOrThrow()).id;
});

describe('projects and cases', () => {
  it('are invisible to another organisation', async () => {
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'Test plant', currency: 'EUR' });
    expect(await findProject(db, { orgId: harrow, projectId: project.id })).toBeUndefined();
    expect((await listProjects(db, { orgId: harrow })).map((p) => p.id)).not.toContain(project.id);
    expect(await createCase(db, { orgId: harrow, projectId: project.id, createdBy: analyst, content })).toBeUndefined();
    const made = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content }))!;
    expect(await findCase(db, { orgId: harrow, caseId: made.id })).toBeUndefined();
    expect(await saveCase(db, { orgId: harrow, caseId: made.id, expectedVersion: 1, content })).toEqual({ ok: false, reason: 'not_found' });
  });

  it('keep their JSON inputs exactly, including option arrays', async () => {
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'JSON plant', currency: 'EUR' });
    const made = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content }))!;
    const read = (await findCase(db, { orgId: kestrel, caseId: made.id }))!;
    expect(read.options).toEqual(content.options);
    expect(read.cash_flows).toEqual(content.cashFlows);
    expect(read.version).toBe(1);
  });

  it('refuse a save based on a stale version and change nothing', async () => {
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'Stale plant', currency: 'EUR' });
    const made = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content }))!;
    const first = await saveCase(db, { orgId: kestrel, caseId: made.id, expectedVersion: 1, content: { ...content, name: 'Revised' } });
    expect(first.ok && first.row.version).toBe(2);
    const stale = await saveCase(db, { orgId: kestrel, caseId: made.id, expectedVersion: 1, content: { ...content, name: 'Overwrite' } });
    expect(stale).toEqual({ ok: false, reason: 'conflict', currentVersion: 2 });
    expect((await findCase(db, { orgId: kestrel, caseId: made.id }))!.name).toBe('Revised');
  });

  it('let exactly one of two concurrent saves on the same version win', async () => {
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'Race plant', currency: 'EUR' });
    const made = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content }))!;
    const results = await Promise.all(
      ['A', 'B'].map((name) => saveCase(db, { orgId: kestrel, caseId: made.id, expectedVersion: 1, content: { ...content, name } })),
    );
    expect(results.filter((r) => r.ok)).toHaveLength(1);
    expect(results.filter((r) => !r.ok)).toEqual([{ ok: false, reason: 'conflict', currentVersion: 2 }]);
  });

  it('duplicate into an independent case', async () => {
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'Copy plant', currency: 'EUR' });
    const made = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content }))!;
    const copy = (await duplicateCase(db, { orgId: kestrel, caseId: made.id, name: 'High volatility', createdBy: analyst }))!;
    await saveCase(db, {
      orgId: kestrel,
      caseId: copy.id,
      expectedVersion: 1,
      content: { ...content, name: 'High volatility', settings: { ...content.settings, volatility: 0.45 } },
    });
    expect(((await findCase(db, { orgId: kestrel, caseId: made.id }))!.settings as { volatility: number }).volatility).toBe(0.3);
    expect(((await findCase(db, { orgId: kestrel, caseId: copy.id }))!.settings as { volatility: number }).volatility).toBe(0.45);
    expect(await duplicateCase(db, { orgId: harrow, caseId: made.id, name: 'x', createdBy: analyst })).toBeUndefined();
  });
});
