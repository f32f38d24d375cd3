/** Supporting documents of a case, always scoped by organisation. */
import type { Database } from '../index';
import type { AttachmentTable } from '../types';

export async function addAttachment(
  db: Database,
  args: { orgId: string; caseId: string; filename: string; kind: AttachmentTable['kind']; data: Buffer; sha256: string; uploadedBy: string },
) {
  return db
    .insertInto('attachment')
    .values({
      organization_id: args.orgId,
      case_id: args.caseId,
      filename: args.filename,
      kind: args.kind,
      size: args.data.length,
      sha256: args.sha256,
      data: args.data,
      uploaded_by: args.uploadedBy,
    })
    .returning(['id', 'filename', 'kind', 'size', 'created_at'])
    .executeTakeFirstOrThrow();
}

export async function listAttachments(db: Database, { orgId, caseId }: { orgId: string; caseId: string }) {
  return db
    .selectFrom('attachment')
    .leftJoin('user', 'user.id', 'attachment.uploaded_by')
    .select(['attachment.id', 'attachment.filename', 'attachment.kind', 'attachment.size', 'attachment.created_at', 'user.name as uploaded_by_name'])
    .where('attachment.organization_id', '=', orgId)
    .where('attachment.case_id', '=', caseId)
    .orderBy('attachment.created_at', 'desc')
    .execute();
}

export async function findAttachment(db: Database, { orgId, attachmentId }: { orgId: string; attachmentId: string }) {
  return db.selectFrom('attachment').selectAll().where('organization_id', '=', orgId).where('id', '=', attachmentId).executeTakeFirst();
}

/** Removes a document; its case and name when it was there. */
export async function deleteAttachment(db: Database, { orgId, attachmentId }: { orgId: string; attachmentId: string }) {
  return db.deleteFrom('attachment').where('organization_id', '=', orgId).where('id', '=', attachmentId).returning(['case_id', 'filename']).executeTakeFirst();
}
