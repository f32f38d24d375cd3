/**
 * The validation report as the API gives it: a PDF (rendered in a thread), a workbook, or the PDF
 * kept with the case as a supporting document, which a reviewer attaches before deciding.
 */
import 'server-only';
import { attachDocument } from '../attachments';
import type { PageSize } from '../board-pack/data';
import { renderPdfInThread } from '../board-pack/pdf-thread';
import type { Member } from '../dal';
import { gatherValidationReport } from './gather';
import { validationWorkbook } from './workbook';

/** Named by project and case, like the case's workbook and its board pack. */
const filename = (data: { project: { name: string }; caseName: string; caseVersion: number }, extension: string) =>
  `${data.project.name} - ${data.caseName} - validation report v${data.caseVersion}.${extension}`;

export async function validationReportPdf(member: Member, caseId: string, pageSize: PageSize, signal?: AbortSignal) {
  const data = await gatherValidationReport(member, caseId, pageSize, signal);
  return { pdf: await renderPdfInThread('validation-report-worker.mjs', data, signal), filename: filename(data, 'pdf') };
}

export async function validationReportWorkbook(member: Member, caseId: string, signal?: AbortSignal) {
  const data = await gatherValidationReport(member, caseId, 'A4', signal);
  return { bytes: await validationWorkbook(data), filename: filename(data, 'xlsx') };
}

/** Renders the A4 report and keeps it with the case (Documents), audited as such. */
export async function attachValidationReport(member: Member, caseId: string, signal?: AbortSignal) {
  return attachDocument(
    member,
    caseId,
    async () => {
      const data = await gatherValidationReport(member, caseId, 'A4', signal);
      const pdf = await renderPdfInThread('validation-report-worker.mjs', data, signal);
      return { filename: filename(data, 'pdf'), kind: 'pdf' as const, data: pdf, detail: { version: data.caseVersion } };
    },
    'case.attach_validation_report',
  );
}
