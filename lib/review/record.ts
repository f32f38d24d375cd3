/**
 * The review workflow's writes, in the caller's transaction: a submission (the frozen snapshot,
 * its figures as the case's latest run, the audit entry) and a decision (the snapshot approved
 * or returned, the audit entry). The routes (lib/review/submit.ts, decide.ts) add their e-mails
 * in the same transaction; the demo seed calls these with its invented history's dates, so a
 * seeded approval is recorded exactly as a reviewer's is.
 *
 * No 'server-only' guard here: the seed runs under plain Node, where that guard throws.
 */
import type { Transaction } from 'kysely';
import { recordAudit } from '@/db/queries/audit';
import { decideCase, submitCase } from '@/db/queries/reviews';
import type { DB } from '@/db/types';
import { recordRun } from '../cases/record-valuation';
import { AppError } from '../errors';
import type { Member } from '../dal';
import type { CaseValuation } from '../value-case';
import { checkTransition } from './transitions';

/** Who acts: the member's organisation, user and role (the demo seed passes its own). */
type Actor = Pick<Member, 'orgId' | 'userId' | 'role'>;

export async function recordSubmission(
  trx: Transaction<DB>,
  args: {
    actor: Actor;
    stored: { id: string; name: string; version: number };
    valuation: Omit<CaseValuation, 'warnings'>;
    recommendation: string;
    /** When; now unless given (the demo seed's history). */
    at?: Date;
  },
) {
  const { actor, stored, valuation } = args;
  const outcome = await submitCase(trx, {
    orgId: actor.orgId,
    caseId: stored.id,
    allowed: (status) => checkTransition(actor.role, 'submit', status),
    userId: actor.userId,
    caseVersion: stored.version,
    frozen: {
      inputs: valuation.inputs,
      model: valuation.model,
      result: valuation.result,
      engineVersion: valuation.result.engineVersion,
      inputHash: valuation.inputHash,
    },
    recommendation: args.recommendation,
    at: args.at,
  });
  if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
  // The submitted figures are also the case's latest run, so every list shows them beside its
  // status, not an older version's.
  await recordRun(trx, actor, stored, valuation);
  await recordAudit(trx, {
    orgId: actor.orgId,
    actorId: actor.userId,
    at: args.at,
    action: 'case.submit',
    subjectType: 'case',
    subjectId: stored.id,
    detail: { name: stored.name, snapshot: outcome.value.id, expandedNpv: valuation.result.expandedNpv },
  });
  return outcome.value;
}

export async function recordDecision(
  trx: Transaction<DB>,
  args: { actor: Actor; stored: { id: string; name: string }; action: 'approve' | 'return'; reason?: string; at?: Date },
) {
  const { actor, stored, action, reason } = args;
  const outcome = await decideCase(trx, {
    orgId: actor.orgId,
    caseId: stored.id,
    allowed: (status) => checkTransition(actor.role, action, status),
    userId: actor.userId,
    reason,
    at: args.at,
  });
  if (!outcome.ok) throw new AppError(outcome.code, outcome.message);
  await recordAudit(trx, {
    orgId: actor.orgId,
    actorId: actor.userId,
    at: args.at,
    action: action === 'approve' ? 'case.approve' : 'case.return',
    subjectType: 'case',
    subjectId: stored.id,
    detail: { name: stored.name, snapshot: outcome.value.id, ...(reason ? { reason } : {}) },
  });
  return outcome.value;
}
