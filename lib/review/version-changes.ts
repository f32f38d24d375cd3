/**
 * What a reviewer needs to know about a submission before deciding: what changed since the
 * version they returned (every differing row of lib/comparison-rows.ts, inputs and results), and
 * whether the same content was approved before. Read from the frozen snapshots alone.
 */
import 'server-only';
import { sql } from 'kysely';
import { db } from '@/db';
import type { ValuationResult } from '@/lattice';
import { comparisonRows, type ComparisonRow } from '../comparison-rows';
import type { CaseInput } from '../validations/case';

export interface VersionChanges {
  /** The version last returned before this submission, and what differs from it; null when none was returned. */
  sinceReturned: { caseVersion: number; decidedAt: string; rows: ComparisonRow[] } | null;
  /** An earlier approved version with exactly these inputs; null when there is none. */
  sameAsApproved: { caseVersion: number; decidedAt: string } | null;
}

export async function versionChanges(orgId: string, caseId: string): Promise<VersionChanges | null> {
  const ofCase = db.selectFrom('case_snapshot').where('organization_id', '=', orgId).where('case_id', '=', caseId);
  const current = await ofCase.select(['id', 'inputs', 'result', 'currency']).where('status', '=', 'in_review').executeTakeFirst();
  if (!current) return null;
  const returned = await ofCase
    .select(['case_version', 'inputs', 'result', 'decided_at'])
    .where('status', '=', 'returned')
    .orderBy('submitted_at', 'desc')
    .executeTakeFirst();
  // Compared in PostgreSQL (jsonb equality), so no earlier inputs travel to the app.
  const same = await ofCase
    .select(['case_version', 'decided_at'])
    .where('status', '=', 'approved')
    .where(sql<boolean>`inputs = (select s.inputs from case_snapshot s where s.id = ${current.id})`)
    .orderBy('decided_at', 'desc')
    .executeTakeFirst();
  const currency = current.currency ?? '';
  return {
    sinceReturned: returned
      ? {
          caseVersion: returned.case_version,
          decidedAt: new Date(returned.decided_at!).toISOString(),
          rows: comparisonRows(
            [returned.inputs as CaseInput, current.inputs as CaseInput],
            [returned.result as ValuationResult, current.result as ValuationResult],
            [currency, currency],
          ).filter((row) => row.differs),
        }
      : null,
    sameAsApproved: same ? { caseVersion: same.case_version, decidedAt: new Date(same.decided_at!).toISOString() } : null,
  };
}
