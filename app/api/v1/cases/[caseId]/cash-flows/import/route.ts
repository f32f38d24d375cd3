// POST /api/v1/cases/{id}/cash-flows/import – read a cash-flow workbook: a preview, or (confirm=true, version=N) save it into the case
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { readUploadForm } from '@/lib/uploads/read-form';
import { presentCase } from '@/lib/case-response';
import { analyseCashFlows, type CashFlowSchedule } from '@/lib/cash-flows';
import { AppError } from '@/lib/errors';
import { inspectUpload } from '@/lib/uploads/inspect';
import { readCashFlowUpload } from '@/lib/uploads/read-in-thread';
import { readCase, saveCase } from '@/lib/cases/service';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(async ({ member, params, request }) => {
  const stored = await readCase(member, params.caseId);
  const { form, file, bytes } = await readUploadForm(request, { what: 'the workbook', choose: 'Choose an XLSX file.' });
  inspectUpload(file.name, bytes, ['xlsx']);
  const read = await readCashFlowUpload(bytes, request.signal);
  if (!read.ok)
    throw new AppError('unprocessable', `The workbook has ${read.problems.length} problem${read.problems.length > 1 ? 's' : ''}; nothing was imported.`, {
      file: read.problems,
    });
  // The case keeps its own timing convention; the workbook brings years, amounts and the WACC.
  const cashFlows: CashFlowSchedule = { ...(stored.cash_flows as CashFlowSchedule), rows: read.input.rows, wacc: read.input.wacc };
  const analysis = analyseCashFlows(cashFlows);
  if (form.get('confirm') !== 'true') return NextResponse.json({ preview: { cashFlows, analysis } });

  const version = Number(form.get('version'));
  if (!Number.isInteger(version) || version < 1)
    throw new AppError('unprocessable', 'Send the version the import was previewed on.', { version: ['Required to confirm.'] });
  const saved = await saveCase(member, stored.id, {
    expectedVersion: version,
    content: { name: stored.name, cashFlows, settings: stored.settings, options: stored.options },
    action: 'case.import',
    detail: { file: file.name, years: read.input.rows.length },
    undone: 'Nothing was imported.',
  });
  return NextResponse.json({ case: presentCase(saved) });
}, operations.importCashFlows);
