/**
 * Board packs in the database: the data a pack is drawn from (one approved snapshot and the
 * names in its record), and the stored PDFs, one per snapshot and page size.
 */
import { createHash } from 'node:crypto';
import { db } from '@/db';
import { AppError } from '../errors';
import type { BoardPackData, PageSize } from './data';

/** Everything the pack shows, from the approved snapshot (and the names of the people in its record). */
export async function boardPackData(orgId: string, snapshotId: string, pageSize: PageSize): Promise<BoardPackData> {
  const row = await db
    .selectFrom('case_snapshot')
    .innerJoin('case', 'case.id', 'case_snapshot.case_id')
    .innerJoin('project', 'project.id', 'case.project_id')
    .innerJoin('organization', 'organization.id', 'case_snapshot.organization_id')
    .leftJoin('user as submitter', 'submitter.id', 'case_snapshot.submitted_by')
    .leftJoin('user as decider', 'decider.id', 'case_snapshot.decided_by')
    .selectAll('case_snapshot')
    .select([
      'project.name as project_name',
      'project.description as project_description',
      'project.currency',
      'organization.name as organization_name',
      'organization.metadata',
      'submitter.name as submitter_name',
      'decider.name as decider_name',
    ])
    .where('case_snapshot.organization_id', '=', orgId)
    .where('case_snapshot.id', '=', snapshotId)
    .executeTakeFirst();
  if (!row || row.status !== 'approved' || !row.decided_at) throw new AppError('not_found', 'No approved snapshot to make a board pack from.');
  return {
    pageSize,
    organisation: row.organization_name,
    isDemo: row.metadata?.includes('"demo":true') ?? false,
    project: { name: row.project_name, description: row.project_description, currency: row.currency },
    snapshot: {
      id: row.id,
      caseName: row.case_name,
      caseVersion: row.case_version,
      inputs: row.inputs as BoardPackData['snapshot']['inputs'],
      model: row.model as BoardPackData['snapshot']['model'],
      result: row.result as BoardPackData['snapshot']['result'],
      engineVersion: row.engine_version,
      inputHash: row.input_hash,
      submittedBy: row.submitter_name ?? 'a former member',
      submittedAt: new Date(row.submitted_at).toISOString(),
      decidedBy: row.decider_name ?? 'a former member',
      decidedAt: new Date(row.decided_at).toISOString(),
    },
  };
}

export async function findBoardPack(orgId: string, snapshotId: string, pageSize: PageSize) {
  return db
    .selectFrom('board_pack')
    .select(['pdf', 'sha256'])
    .where('organization_id', '=', orgId)
    .where('snapshot_id', '=', snapshotId)
    .where('page_size', '=', pageSize)
    .executeTakeFirst();
}

/** Stores a rendered pack; when two first requests race, both rendered the same bytes and the first insert wins. */
export async function saveBoardPack(orgId: string, snapshotId: string, pageSize: PageSize, pdf: Buffer): Promise<{ pdf: Buffer; sha256: string }> {
  const sha256 = createHash('sha256').update(pdf).digest('hex');
  await db
    .insertInto('board_pack')
    .values({ organization_id: orgId, snapshot_id: snapshotId, page_size: pageSize, pdf, sha256 })
    .onConflict((c) => c.columns(['snapshot_id', 'page_size']).doNothing())
    .execute();
  return { pdf, sha256 };
}
