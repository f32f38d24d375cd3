/**
 * Seeds Kestrel Bay's invented portfolio (demo/portfolio.ts): each project with its cases and
 * one stored valuation run per case, as if the demo analyst had built and valued them, with
 * the matching audit entries; the cases marked for review are submitted (the submission keeps
 * their run) and approved, with their board pack, through the workflow's own writes
 * (lib/review/record.ts) as the demo analyst and reviewer would. Idempotent: a project that already
 * exists by name is left alone.
 */
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { createCase } from '@/db/queries/cases';
import { createProject, findProjectByName } from '@/db/queries/projects';
import { valueProject } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { hashModel, hashResult } from '@/lib/model-hash';
import { pageSizes } from '@/lib/board-pack/data';
import { boardPackData, saveBoardPack } from '@/lib/board-pack/records';
import { renderBoardPack } from '@/lib/board-pack/render';
import { recordValuation } from '@/lib/cases/record-valuation';
import { recordDecision, recordSubmission } from '@/lib/review/record';
import { historyOf, seedFollow } from './seed-follow';
import { demoPortfolio } from './portfolio';

export async function seedPortfolio(args: { orgId: string; analystId: string; reviewerId?: string; currency: string }): Promise<string[]> {
  const created: string[] = [];
  const actor = { orgId: args.orgId, actorId: args.analystId };
  for (const demo of demoPortfolio) {
    if (await findProjectByName(db, { orgId: args.orgId, name: demo.name })) continue;
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
      const valuation = { inputs: input, model, result, inputHash: hashModel(model), resultHash: hashResult(result) };
      const stored = { id: made.id, name: input.name, version: made.version };
      const review = args.reviewerId ? demo.reviews?.find((r) => r.caseIndex === index) : undefined;
      // A submission values the case and keeps that run itself; the other cases were valued by hand.
      if (review && args.reviewerId) {
        const snapshotId = await seedReview({
          ...args,
          reviewerId: args.reviewerId,
          stored,
          valuation,
          outcome: review.outcome,
          recommendation: review.recommendation,
          history,
        });
        if (snapshotId) approved.push({ caseId: made.id, snapshotId });
      } else
        await db
          .transaction()
          .execute((trx) => recordValuation(trx, { actor: { orgId: args.orgId, userId: args.analystId }, stored, valuation, at: history?.built }));
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

/**
 * Submits a seeded case as the analyst and, for an approved one, approves it as the reviewer,
 * through the same writes as the workflow's routes (lib/review/record.ts) without their e-mails;
 * the approved snapshot's id.
 */
async function seedReview(args: {
  orgId: string;
  analystId: string;
  reviewerId: string;
  stored: { id: string; name: string; version: number };
  valuation: Parameters<typeof recordSubmission>[1]['valuation'];
  outcome: 'approved' | 'in_review';
  recommendation: string;
  history?: { submitted: Date; approved: Date };
}) {
  const { stored, history } = args;
  await db.transaction().execute((trx) =>
    recordSubmission(trx, {
      actor: { orgId: args.orgId, userId: args.analystId, role: 'analyst' },
      stored,
      valuation: args.valuation,
      recommendation: args.recommendation,
      at: history?.submitted,
    }),
  );
  if (args.outcome !== 'approved') return null;
  const approved = await db
    .transaction()
    .execute((trx) =>
      recordDecision(trx, { actor: { orgId: args.orgId, userId: args.reviewerId, role: 'reviewer' }, stored, action: 'approve', at: history?.approved }),
    );
  return approved.id;
}
