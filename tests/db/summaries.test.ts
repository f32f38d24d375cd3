/**
 * The portfolio and project read models: a project's headline is its most recently valued
 * case's latest run, read from the stored result; activity covers the project and its cases,
 * and nothing of another organisation shows up.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { createCase } from '@/db/queries/cases';
import { createProject } from '@/db/queries/projects';
import { latestRunByCase, listProjectActivity, listProjectSummaries } from '@/db/queries/summaries';
import { recordValuationRun } from '@/db/queries/valuation-runs';
import { minimalCase as content, seededDemo } from './support/demo';

let kestrel = '';
let harrow = '';
let analyst = '';

function run(caseId: string, expandedNpv: number) {
  return recordValuationRun(db, {
    orgId: kestrel,
    caseId,
    caseVersion: 1,
    input: {},
    inputHash: 'x',
    resultHash: 'x',
    result: { value: expandedNpv, staticNpv: 1, expandedNpv, optionPremium: expandedNpv - 1 },
    engineVersion: 'test',
    createdBy: analyst,
  });
}

beforeAll(async () => {
  ({ kestrel, harrow, analyst } = await seededDemo());
});

describe('project summaries', () => {
  it("take the latest run of the first valued case (the base case), and count the project's cases", async () => {
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'Summary plant', currency: 'EUR' });
    const a = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content }))!;
    const b = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content: { ...content, name: 'Copy' } }))!;
    await run(a.id, 10);
    await run(a.id, 11);
    await run(b.id, 7);
    const summary = (await listProjectSummaries(db, { orgId: kestrel })).find((p) => p.id === project.id)!;
    expect(summary.caseCount).toBe(2);
    expect(summary.ownerName).toBe('Priya Lindqvist');
    expect(summary.latest).toMatchObject({ caseId: a.id, caseName: 'Base', expandedNpv: 11, optionPremium: 10, staticNpv: 1 });
    const byCase = await latestRunByCase(db, { orgId: kestrel, projectId: project.id });
    expect(byCase.get(a.id)?.expandedNpv).toBe(11);
    expect(byCase.get(b.id)?.expandedNpv).toBe(7);
    expect((await listProjectSummaries(db, { orgId: harrow })).map((p) => p.id)).not.toContain(project.id);
  });

  it('a project never valued has no headline', async () => {
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'Unvalued plant', currency: 'EUR' });
    const summary = (await listProjectSummaries(db, { orgId: kestrel })).find((p) => p.id === project.id)!;
    expect(summary).toMatchObject({ caseCount: 0, latest: null });
  });
});

describe('project activity', () => {
  it("lists the project's and its cases' entries (a deleted case's too), not other projects'", async () => {
    const project = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'Activity plant', currency: 'EUR' });
    const other = await createProject(db, { orgId: kestrel, ownerId: analyst, name: 'Other plant', currency: 'EUR' });
    const c = (await createCase(db, { orgId: kestrel, projectId: project.id, createdBy: analyst, content }))!;
    const base = { orgId: kestrel, actorId: analyst };
    await recordAudit(db, { ...base, action: 'project.create', subjectType: 'project', subjectId: project.id });
    await recordAudit(db, { ...base, action: 'case.update', subjectType: 'case', subjectId: c.id });
    await recordAudit(db, { ...base, action: 'case.delete', subjectType: 'case', subjectId: 'gone', detail: { projectId: project.id } });
    await recordAudit(db, { ...base, action: 'project.create', subjectType: 'project', subjectId: other.id });
    await recordAudit(db, { orgId: harrow, actorId: null, action: 'project.update', subjectType: 'project', subjectId: project.id });
    const actions = (await listProjectActivity(db, { orgId: kestrel, projectId: project.id })).map((e) => `${e.action}:${e.subject_id}`);
    expect(actions).toEqual([`case.delete:gone`, `case.update:${c.id}`, `project.create:${project.id}`]);
  });
});
