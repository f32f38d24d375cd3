/**
 * A case's supporting documents as the API changes them: each change with its audit entry in one
 * transaction, every lookup scoped to the member's organisation.
 */
import 'server-only';
import { createHash } from 'node:crypto';
import { db } from '@/db';
import { addAttachment, deleteAttachment, findAttachment, listAttachments } from '@/db/queries/attachments';
import { recordAudit } from '@/db/queries/audit';
import type { AttachmentTable } from '@/db/types';
import { requireCase } from './cases/require-case';
import type { Member } from './dal';
import { AppError } from './errors';

const missing = () => new AppError('not_found', 'No such document in your organisation.');

/** A document as the API answers it. */
export interface AttachmentAnswer {
  id: string;
  filename: string;
  kind: AttachmentTable['kind'];
  size: number;
  uploadedBy: string | null;
  uploadedAt: Date;
}

export async function listCaseAttachments(member: Member, caseId: string): Promise<AttachmentAnswer[]> {
  await requireCase(db, member.orgId, caseId);
  const rows = await listAttachments(db, { orgId: member.orgId, caseId });
  return rows.map((r) => ({ id: r.id, filename: r.filename, kind: r.kind, size: r.size, uploadedBy: r.uploaded_by_name, uploadedAt: r.created_at }));
}

/**
 * Keeps a document with a case. The case is looked up before `read` produces the file, so another
 * organisation's member learns nothing from a refused upload (404 first). `action` names the audit
 * entry (an upload is `case.attach`), to whose detail the file's own adds; its name is made safe to store.
 */
export async function attachDocument(
  member: Member,
  caseId: string,
  read: () => Promise<{ filename: string; kind: AttachmentTable['kind']; data: Buffer; detail?: Record<string, unknown> }>,
  action = 'case.attach',
): Promise<AttachmentAnswer> {
  const found = await requireCase(db, member.orgId, caseId);
  const file = await read();
  const filename = file.filename.replace(/[\\/\u0000-\u001f]/g, '_').slice(0, 200);
  const made = await db.transaction().execute(async (trx) => {
    const made = await addAttachment(trx, {
      orgId: member.orgId,
      caseId: found.id,
      filename,
      kind: file.kind,
      data: file.data,
      sha256: createHash('sha256').update(file.data).digest('hex'),
      uploadedBy: member.userId,
    });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action,
      subjectType: 'case',
      subjectId: found.id,
      detail: { name: found.name, file: filename, size: file.data.length, ...file.detail },
    });
    return made;
  });
  return { id: made.id, filename: made.filename, kind: made.kind, size: made.size, uploadedBy: member.name, uploadedAt: made.created_at };
}

export async function readAttachment(member: Member, attachmentId: string) {
  const found = await findAttachment(db, { orgId: member.orgId, attachmentId });
  if (!found) throw missing();
  return found;
}

export async function removeAttachment(member: Member, attachmentId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const gone = await deleteAttachment(trx, { orgId: member.orgId, attachmentId });
    if (!gone) throw missing();
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.detach',
      subjectType: 'case',
      subjectId: gone.case_id,
      detail: { file: gone.filename },
    });
  });
}
