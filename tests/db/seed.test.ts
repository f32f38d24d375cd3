/** The demo seed creates the invented organisations and portfolio once, with the right roles, and is idempotent. */
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { demoPortfolio } from '@/demo/portfolio';
import { seedDemo } from '@/demo/seed';
import { listProjectSummaries } from '@/db/queries/summaries';

describe('demo seed', () => {
  it('creates both organisations and five users, and changes nothing the second time', async () => {
    await seedDemo();
    const second = await seedDemo();
    expect(second.created).toEqual([]);
    const rows = await db
      .selectFrom('member')
      .innerJoin('user', 'user.id', 'member.userId')
      .innerJoin('organization', 'organization.id', 'member.organizationId')
      .select(['user.email', 'member.role', 'organization.name', 'user.emailVerified'])
      .orderBy('user.email')
      .execute();
    expect(rows).toEqual([
      { email: 'admin@kestrelbay.example', role: 'admin', name: 'Kestrel Bay Materials', emailVerified: true },
      { email: 'analyst@kestrelbay.example', role: 'analyst', name: 'Kestrel Bay Materials', emailVerified: true },
      { email: 'executive@kestrelbay.example', role: 'viewer', name: 'Kestrel Bay Materials', emailVerified: true },
      { email: 'owner@harrowfen.example', role: 'admin', name: 'Harrow Fen Logistics', emailVerified: true },
      { email: 'reviewer@kestrelbay.example', role: 'reviewer', name: 'Kestrel Bay Materials', emailVerified: true },
    ]);
  });

  it('gives Kestrel Bay the four invented projects, each with two valued cases, and Harrow Fen none of them', async () => {
    const names = demoPortfolio.map((p) => p.name);
    const projects = await db
      .selectFrom('project')
      .innerJoin('organization', 'organization.id', 'project.organization_id')
      .select(['project.id', 'project.name', 'organization.slug'])
      .where('project.name', 'in', names)
      .orderBy('project.name')
      .execute();
    expect(projects.map((p) => [p.name, p.slug])).toEqual(
      ['Cold-storage hub', 'Older extrusion line', 'Phased bio-resin plant', 'Staged pilot line'].map((name) => [name, 'kestrel-bay-materials']),
    );
    const cases = await db
      .selectFrom('case')
      .leftJoin('valuation_run', 'valuation_run.case_id', 'case.id')
      .select((eb) => ['case.id', eb.fn.count<string>('valuation_run.id').as('runs')])
      .where(
        'case.project_id',
        'in',
        projects.map((p) => p.id),
      )
      .groupBy('case.id')
      .execute();
    expect(cases.map((c) => Number(c.runs))).toEqual([1, 1, 1, 1, 1, 1, 1, 1]);
  });

  it('heads every project with its base case: the case made first, even in a project dated in the past', async () => {
    const kestrel = (await db.selectFrom('organization').select('id').where('slug', '=', 'kestrel-bay-materials').executeTakeFirstOrThrow()).id;
    const summaries = await listProjectSummaries(db, { orgId: kestrel });
    const demoNames = new Set(demoPortfolio.map((p) => p.name));
    const heads = summaries.filter((p) => demoNames.has(p.name)).map((p) => [p.name, p.latest?.caseName]);
    // The plant is dated two years back (its followed approval); its two cases once shared one date.
    expect(heads).toEqual(demoPortfolio.map((p) => [p.name, p.cases[0]!.name]).sort((a, b) => a[0]!.localeCompare(b[0]!)));
    const dates = await db
      .selectFrom('case')
      .innerJoin('project', 'project.id', 'case.project_id')
      .select(['project.name', 'case.created_at'])
      .where('project.name', 'in', [...demoNames])
      .execute();
    for (const name of demoNames) {
      const made = dates.filter((d) => d.name === name).map((d) => +d.created_at);
      expect(new Set(made).size).toBe(made.length);
    }
  });

  it("approves the plant's base case with its board pack, and leaves the hub's base case waiting for review", async () => {
    const reviews = await db
      .selectFrom('case_snapshot')
      .innerJoin('case', 'case.id', 'case_snapshot.case_id')
      .innerJoin('project', 'project.id', 'case.project_id')
      .leftJoin('board_pack', 'board_pack.snapshot_id', 'case_snapshot.id')
      .leftJoin('user as submitter', 'submitter.id', 'case_snapshot.submitted_by')
      .leftJoin('user as decider', 'decider.id', 'case_snapshot.decided_by')
      .select([
        'project.name as project',
        'case.name as case',
        'case.status',
        'submitter.email as submitter',
        'decider.email as decider',
        'board_pack.page_size',
      ])
      .where('project.name', 'in', ['Phased bio-resin plant', 'Cold-storage hub'])
      .orderBy('project.name')
      .orderBy('board_pack.page_size')
      .execute();
    // Both page sizes are rendered at approval, so the record never changes afterwards.
    expect(reviews).toEqual([
      { project: 'Cold-storage hub', case: 'Base case', status: 'in_review', submitter: 'analyst@kestrelbay.example', decider: null, page_size: null },
      {
        project: 'Phased bio-resin plant',
        case: 'Base case',
        status: 'approved',
        submitter: 'analyst@kestrelbay.example',
        decider: 'reviewer@kestrelbay.example',
        page_size: 'A4',
      },
      {
        project: 'Phased bio-resin plant',
        case: 'Base case',
        status: 'approved',
        submitter: 'analyst@kestrelbay.example',
        decider: 'reviewer@kestrelbay.example',
        page_size: 'LETTER',
      },
    ]);
  });
});
