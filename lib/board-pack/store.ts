/**
 * Board packs are rendered once per approved snapshot and page size, stored in PostgreSQL and
 * served from there: the same snapshot always gives the same bytes. Rendering runs in a worker
 * thread (.data/board-pack-worker.mjs), never on the request's event loop.
 */
import 'server-only';
import { db } from '@/db';
import { latestApprovedSnapshot } from '@/db/queries/reviews';
import { requireCase } from '../cases/require-case';
import type { Member } from '../dal';
import { AppError } from '../errors';
import { readProject } from '../projects/service';
import { sharedWhileRunning } from '../shared-answer';
import type { PageSize } from './data';
import { renderPdfInThread } from './pdf-thread';
import { boardPackData, findBoardPack, saveBoardPack } from './records';

/**
 * The stored pack for the snapshot and page size, rendering and storing it the first time. Two
 * requests in this process while it renders share the one render (a render is seconds of a
 * thread and a place among two).
 */
export function ensureBoardPack(orgId: string, snapshotId: string, pageSize: PageSize): Promise<{ pdf: Buffer; sha256: string }> {
  return sharedWhileRunning(`board-pack:${orgId}:${snapshotId}:${pageSize}`, async () => {
    const stored = await findBoardPack(orgId, snapshotId, pageSize);
    if (stored) return stored;
    const pdf = await renderPdfInThread('board-pack-worker.mjs', await boardPackData(orgId, snapshotId, pageSize));
    return saveBoardPack(orgId, snapshotId, pageSize, pdf);
  });
}

/** The board pack of the case's latest approved version, for a member of its organisation. */
export async function latestBoardPack(member: Member, caseId: string, pageSize: PageSize) {
  const found = await requireCase(db, member.orgId, caseId);
  const [snapshot, project] = await Promise.all([latestApprovedSnapshot(db, { orgId: member.orgId, caseId: found.id }), readProject(member, found.project_id)]);
  if (!snapshot) throw new AppError('not_found', 'This case has no approved snapshot yet, so there is no board pack.');
  return { projectName: project.name, caseName: found.name, ...(await ensureBoardPack(member.orgId, snapshot.id, pageSize)) };
}
