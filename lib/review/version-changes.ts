/**
 * What a reviewer needs to know about a submission before deciding: what changed since the
 * version they returned (every differing row of lib/comparison-rows.ts, inputs and results), and
 * whether the same content was approved before. Read from the frozen snapshots alone.
 */
import 'server-only';
import { db } from '@/db';
import { findSubmissionContext } from '@/db/queries/reviews';
import { comparisonRows, type ComparisonRow } from '../comparison-rows';
import { readStoredCaseInput, storedInputsKey } from '../validations/case';
import { readStoredResult } from '@/lattice';

export interface VersionChanges {
  /** The version last returned before this submission, and what differs from it; null when none was returned. */
  sinceReturned: { caseVersion: number; decidedAt: string; rows: ComparisonRow[] } | null;
  /** An earlier approved version with exactly these inputs; null when there is none. */
  sameAsApproved: { caseVersion: number; decidedAt: string } | null;
}

export async function versionChanges(orgId: string, caseId: string): Promise<VersionChanges | null> {
  const found = await findSubmissionContext(db, { orgId, caseId });
  if (!found) return null;
  const { current, returned, approved } = found;
  const currentKey = storedInputsKey(current.inputs);
  const same = approved.find((a) => storedInputsKey(a.inputs) === currentKey);
  const currency = current.currency ?? '';
  return {
    sinceReturned: returned
      ? {
          caseVersion: returned.case_version,
          decidedAt: new Date(returned.decided_at!).toISOString(),
          rows: comparisonRows(
            [readStoredCaseInput(returned.inputs), readStoredCaseInput(current.inputs)],
            [readStoredResult(returned.result), readStoredResult(current.result)],
            [currency, currency],
          ).filter((row) => row.differs),
        }
      : null,
    sameAsApproved: same ? { caseVersion: same.case_version, decidedAt: new Date(same.decided_at!).toISOString() } : null,
  };
}
