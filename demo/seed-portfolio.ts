/**
 * Seeds Kestrel Bay's invented portfolio (demo/portfolio.ts): each project with its cases and
 * one stored valuation run per case, as if the demo analyst had built and valued them, with
 * the matching audit entries. Idempotent: a project that already exists by name is left alone.
 */
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { createCase } from '@/db/queries/cases';
import { createProject } from '@/db/queries/projects';
import { recordValuationRun } from '@/db/queries/valuation-runs';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { hashModel } from '@/lib/model-hash';
import { demoPortfolio } from './portfolio';

export async function seedPortfolio(args: { orgId: string; analystId: string; currency: string }): Promise<string[]> {
  const created: string[] = [];
  const actor = { orgId: args.orgId, actorId: args.analystId };
  for (const demo of demoPortfolio) {
    const exists = await db.selectFrom('project').select('id').where('organization_id', '=', args.orgId).where('name', '=', demo.name).executeTakeFirst();
    if (exists) continue;
    const project = await createProject(db, {
      orgId: args.orgId,
      ownerId: args.analystId,
      name: demo.name,
      description: demo.description,
      currency: args.currency,
    });
    await recordAudit(db, { ...actor, action: 'project.create', subjectType: 'project', subjectId: project.id, detail: { name: demo.name } });
    for (const input of demo.cases) {
      const made = await createCase(db, { orgId: args.orgId, projectId: project.id, createdBy: args.analystId, content: { options: [], ...input } });
      if (!made) throw new Error(`seed: the project ${demo.name} vanished while seeding`);
      await recordAudit(db, { ...actor, action: 'case.create', subjectType: 'case', subjectId: made.id, detail: { name: input.name, projectId: project.id } });
      const { model } = caseToModel(input);
      const result = valueProject(model);
      const run = await recordValuationRun(db, {
        orgId: args.orgId,
        caseId: made.id,
        caseVersion: made.version,
        input: model,
        inputHash: hashModel(model),
        result,
        engineVersion: result.engineVersion,
        createdBy: args.analystId,
      });
      await recordAudit(db, {
        ...actor,
        action: 'case.value',
        subjectType: 'case',
        subjectId: made.id,
        detail: {
          run: run.id,
          name: input.name,
          value: result.value,
          staticNpv: result.staticNpv,
          expandedNpv: result.expandedNpv,
          optionPremium: result.optionPremium,
        },
      });
    }
    created.push(demo.name);
  }
  return created;
}
