/**
 * Seeds Kestrel Bay's invented portfolio (demo/portfolio.ts): each project with its cases and
 * one stored valuation run per case, as if the demo analyst had built and valued them, with
 * the matching audit entries; the cases marked for review are submitted (and approved, with
 * their board pack) as the demo analyst and reviewer would. Idempotent: a project that already
 * exists by name is left alone.
 */
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { createCase } from '@/db/queries/cases';
import { createProject } from '@/db/queries/projects';
import { recordValuationRun } from '@/db/queries/valuation-runs';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { hashModel, hashResult } from '@/lib/model-hash';
import { decideCase, submitCase, type FrozenValuation } from '@/db/queries/reviews';
import { pageSizes } from '@/lib/board-pack/data';
import { boardPackData, saveBoardPack } from '@/lib/board-pack/records';
import { renderBoardPack } from '@/lib/board-pack/render';
import { checkTransition } from '@/lib/review/transitions';
import { historyOf, seedFollow } from './seed-follow';
import { demoPortfolio } from './portfolio';

export async function seedPortfolio(args: { orgId: string; analystId: string; reviewerId?: string; currency: string }): Promise<string[]> {
  const created: string[] = [];
  const actor = { orgId: args.orgId, actorId: args.analystId };
  for (const demo of demoPortfolio) {
    const exists = await db.selectFrom('project').select('id').where('organization_id', '=', args.orgId).where('name', '=', demo.name).executeTakeFirst();
    if (exists) continue;
    // A followed project's history began in the past (demo/seed-follow.ts); the others' now.
    const history = demo.follow ? historyOf(demo.follow) : undefined;
    const project = await createProject(db, {
      orgId: args.orgId,
      ownerId: args.analystId,
      name: demo.name,
      description: demo.description,
      currency: args.currency,
    });
    await recordAudit(db, {
      ...actor,
      at: history?.built,
      action: 'project.create',
      subjectType: 'project',
      subjectId: project.id,
      detail: { name: demo.name },
    });
    const approved: { caseId: string; snapshotId: string }[] = [];
    for (const [index, input] of demo.cases.entries()) {
      const made = await createCase(db, { orgId: args.orgId, projectId: project.id, createdBy: args.analystId, content: { options: [], ...input } });
      if (!made) throw new Error(`seed: the project ${demo.name} vanished while seeding`);
      await recordAudit(db, {
        ...actor,
        at: history?.built,
        action: 'case.create',
        subjectType: 'case',
        subjectId: made.id,
        detail: { name: input.name, projectId: project.id },
      });
      const { model } = caseToModel(input);
      const result = valueProject(model);
      const run = await recordValuationRun(db, {
        orgId: args.orgId,
        caseId: made.id,
        caseVersion: made.version,
        input: model,
        inputHash: hashModel(model),
        result,
        resultHash: hashResult(result),
        engineVersion: result.engineVersion,
        createdBy: args.analystId,
        volatilitySource: input.settings.volatilitySource ?? null,
      });
      await recordAudit(db, {
        ...actor,
        at: history?.built,
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
      const review = demo.reviews?.find((r) => r.caseIndex === index);
      if (review && args.reviewerId) {
        const snapshotId = await seedReview({
          ...args,
          reviewerId: args.reviewerId,
          caseId: made.id,
          caseName: input.name,
          outcome: review.outcome,
          recommendation: review.recommendation,
          frozen: { inputs: input, model, result, engineVersion: result.engineVersion, inputHash: hashModel(model) },
          history,
        });
        if (snapshotId) approved.push({ caseId: made.id, snapshotId });
      }
    }
    // Followed since an approval in the past (demo/seed-follow.ts), then the packs are rendered,
    // so they carry the approval date every other page shows.
    if (demo.follow && approved[0])
      await seedFollow({ orgId: args.orgId, analystId: args.analystId, projectId: project.id, caseId: approved[0].caseId, follow: demo.follow });
    for (const { snapshotId } of approved)
      for (const size of pageSizes) await saveBoardPack(args.orgId, snapshotId, size, await renderBoardPack(await boardPackData(args.orgId, snapshotId, size)));
    created.push(demo.name);
  }
  return created;
}

/** Submits a seeded case as the analyst and, for an approved one, approves it as the reviewer; the approved snapshot's id. */
async function seedReview(args: {
  orgId: string;
  analystId: string;
  reviewerId: string;
  caseId: string;
  caseName: string;
  outcome: 'approved' | 'in_review';
  recommendation: string;
  frozen: FrozenValuation;
  history?: { submitted: Date; approved: Date };
}) {
  await db.transaction().execute(async (trx) => {
    const outcome = await submitCase(trx, {
      orgId: args.orgId,
      caseId: args.caseId,
      allowed: (status) => checkTransition('analyst', 'submit', status),
      userId: args.analystId,
      caseVersion: 1,
      frozen: args.frozen,
      recommendation: args.recommendation,
      at: args.history?.submitted,
    });
    if (!outcome.ok) throw new Error(`seed: could not submit ${args.caseName}: ${outcome.message}`);
    await recordAudit(trx, {
      orgId: args.orgId,
      actorId: args.analystId,
      at: args.history?.submitted,
      action: 'case.submit',
      subjectType: 'case',
      subjectId: args.caseId,
      detail: { name: args.caseName, snapshot: outcome.value.id },
    });
  });
  if (args.outcome !== 'approved') return null;
  const approved = await db.transaction().execute(async (trx) => {
    const outcome = await decideCase(trx, {
      orgId: args.orgId,
      caseId: args.caseId,
      allowed: (status) => checkTransition('reviewer', 'approve', status),
      userId: args.reviewerId,
      at: args.history?.approved,
    });
    if (!outcome.ok) throw new Error(`seed: could not approve ${args.caseName}: ${outcome.message}`);
    await recordAudit(trx, {
      orgId: args.orgId,
      actorId: args.reviewerId,
      at: args.history?.approved,
      action: 'case.approve',
      subjectType: 'case',
      subjectId: args.caseId,
      detail: { name: args.caseName, snapshot: outcome.value.id },
    });
    return outcome.value;
  });
  return approved.id;
}
