/**
 * The validation report as the API gives it: a PDF (rendered in a thread), a workbook, or the PDF
 * kept with the case as a supporting document, which a reviewer attaches before deciding.
 */
import 'server-only';
import { createHash } from 'node:crypto';
import { db } from '@/db';
import { addAttachment } from '@/db/queries/attachments';
import { recordAudit } from '@/db/queries/audit';
import type { PageSize } from '../board-pack/data';
import { renderPdfInThread } from '../board-pack/pdf-thread';
import type { Member } from '../dal';
import { gatherValidationReport } from './gather';
import { validationWorkbook } from './workbook';

const filename = (caseName: string, version: number, extension: string) => `${caseName} - validation report v${version}.${extension}`;

export async function validationReportPdf(member: Member, caseId: string, pageSize: PageSize, signal?: AbortSignal) {
  const data = await gatherValidationReport(member, caseId, pageSize, signal);
  return { pdf: await renderPdfInThread('validation-report-worker.mjs', data), filename: filename(data.caseName, data.caseVersion, 'pdf') };
}

export async function validationReportWorkbook(member: Member, caseId: string, signal?: AbortSignal) {
  const data = await gatherValidationReport(member, caseId, 'A4', signal);
  return { bytes: await validationWorkbook(data), filename: filename(data.caseName, data.caseVersion, 'xlsx') };
}

/** Renders the A4 report and keeps it with the case (Documents), with its audit entry in the same transaction. */
export async function attachValidationReport(member: Member, caseId: string, signal?: AbortSignal) {
  const data = await gatherValidationReport(member, caseId, 'A4', signal);
  const pdf = await renderPdfInThread('validation-report-worker.mjs', data);
  const name = filename(data.caseName, data.caseVersion, 'pdf')
    .replace(/[\\/\u0000-\u001f]/g, '_')
    .slice(0, 200);
  const made = await db.transaction().execute(async (trx) => {
    const made = await addAttachment(trx, {
      orgId: member.orgId,
      caseId,
      filename: name,
      kind: 'pdf',
      data: pdf,
      sha256: createHash('sha256').update(pdf).digest('hex'),
      uploadedBy: member.userId,
    });
    await recordAudit(trx, {
      orgId: member.orgId,
      actorId: member.userId,
      action: 'case.attach_validation_report',
      subjectType: 'case',
      subjectId: caseId,
      detail: { name: data.caseName, version: data.caseVersion, file: name, size: pdf.length },
    });
    return made;
  });
  return { id: made.id, filename: made.filename, kind: made.kind, size: made.size, uploadedBy: member.name, uploadedAt: made.created_at };
}
