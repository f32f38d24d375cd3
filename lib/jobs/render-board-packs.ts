/**
 * A worker's side of an approval: renders the approved snapshot's board pack in every page size
 * (each stored once; a second attempt finds them stored) and then queues the analyst's e-mail
 * with the A4 pack attached.
 */
import { pageSizes } from '../board-pack/data';
import { ensureBoardPack } from '../board-pack/store';
import { queueMail } from '../mail';
import type { BoardPackJob } from './queues';

export async function renderBoardPacks(job: BoardPackJob): Promise<void> {
  for (const size of pageSizes) await ensureBoardPack(job.orgId, job.snapshotId, size);
  if (!job.mail) return;
  const { filename, ...mail } = job.mail;
  await queueMail({ ...mail, boardPack: { orgId: job.orgId, snapshotId: job.snapshotId, pageSize: 'A4', filename } });
}
