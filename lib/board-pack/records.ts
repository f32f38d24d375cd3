/**
 * Board packs in the database: the data a pack is drawn from (one approved snapshot and the
 * names in its record), and the stored PDFs, one per snapshot and page size.
 */
import { createHash } from 'node:crypto';
import { db } from '@/db';
import { findSnapshotForPack, findStoredPack, followThroughBefore, insertStoredPack, listSubmissionsUpTo } from '@/db/queries/board-packs';
import { AppError } from '../errors';
import { readStoredCaseInput } from '../validations/case';
import type { BoardPackData, FollowThrough, PageSize, RecordEvent } from './data';
import { readStoredModel, readStoredResult } from '@/lattice';

/** Who did it, when they have left the organisation since. */
const FORMER_MEMBER = 'a former member';

/**
 * Everything the pack shows, from the approved snapshot alone: its frozen inputs and results and
 * the names captured at submission and decision, never today's names (migration 0007).
 */
export async function boardPackData(orgId: string, snapshotId: string, pageSize: PageSize): Promise<BoardPackData> {
  const row = await findSnapshotForPack(db, { orgId, snapshotId });
  if (!row || row.status !== 'approved' || !row.decided_at) throw new AppError('not_found', 'No approved snapshot to make a board pack from.');
  const earlier = await listSubmissionsUpTo(db, { orgId, caseId: row.case_id, snapshotId: row.id });
  const record: RecordEvent[] = earlier.flatMap((s): RecordEvent[] => {
    const submitted: RecordEvent = {
      kind: 'submitted',
      caseVersion: s.case_version,
      by: s.submitted_by_name ?? FORMER_MEMBER,
      at: new Date(s.submitted_at).toISOString(),
    };
    if (!s.decided_at || s.status === 'in_review') return [submitted];
    const decided = new Date(s.decided_at).toISOString();
    if (s.status === 'withdrawn') return [submitted, { kind: 'withdrawn', caseVersion: s.case_version, by: s.submitted_by_name ?? FORMER_MEMBER, at: decided }];
    return [
      submitted,
      {
        kind: s.status,
        caseVersion: s.case_version,
        by: s.decided_by_name ?? FORMER_MEMBER,
        at: decided,
        ...(s.decision_reason ? { reason: s.decision_reason } : {}),
      },
    ];
  });
  const followed = await followThrough(orgId, row.case_id, row.id);
  return {
    ...(followed ? { followThrough: followed } : {}),
    pageSize,
    organisation: row.organization_name ?? '',
    isDemo: row.organization_is_demo ?? false,
    project: { name: row.project_name ?? row.case_name, description: row.project_description ?? '', currency: row.currency ?? '' },
    snapshot: {
      id: row.id,
      caseName: row.case_name,
      caseVersion: row.case_version,
      inputs: readStoredCaseInput(row.inputs) as BoardPackData['snapshot']['inputs'],
      model: readStoredModel(row.model),
      result: readStoredResult(row.result) as BoardPackData['snapshot']['result'],
      engineVersion: row.engine_version,
      inputHash: row.input_hash,
      submittedBy: row.submitted_by_name ?? FORMER_MEMBER,
      submittedAt: new Date(row.submitted_at).toISOString(),
      decidedBy: row.decided_by_name ?? FORMER_MEMBER,
      decidedAt: new Date(row.decided_at).toISOString(),
      recommendation: row.recommendation,
    },
    record,
  };
}

/** How the version approved before was followed, as the pack prints it; nothing for a first approval. */
async function followThrough(orgId: string, caseId: string, snapshotId: string): Promise<FollowThrough | undefined> {
  const found = await followThroughBefore(db, { orgId, caseId, snapshotId });
  if (!found) return undefined;
  return {
    caseVersion: found.previous.caseVersion,
    approvedAt: new Date(found.previous.decidedAt).toISOString(),
    observations: found.observations,
    decisions: found.decisions.map((d) => ({ ...d, by: d.by ?? FORMER_MEMBER })),
  };
}

export async function findBoardPack(orgId: string, snapshotId: string, pageSize: PageSize) {
  return findStoredPack(db, { orgId, snapshotId, pageSize });
}

/**
 * Stores a rendered pack with its SHA-256 and answers the stored one: of two racing inserts
 * (another process rendered it too) db/queries/board-packs.ts keeps the first, and every
 * download of a snapshot's pack is then those bytes.
 */
export async function saveBoardPack(orgId: string, snapshotId: string, pageSize: PageSize, pdf: Buffer): Promise<{ pdf: Buffer; sha256: string }> {
  const sha256 = createHash('sha256').update(pdf).digest('hex');
  if (await insertStoredPack(db, { orgId, snapshotId, pageSize, pdf, sha256 })) return { pdf, sha256 };
  return (await findBoardPack(orgId, snapshotId, pageSize)) ?? { pdf, sha256 };
}
