// GET /api/v1/cases/{caseId}/validation-report – the validation report of the case as saved, as a PDF (?size=A4|LETTER)
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { validationReportPdf } from '@/lib/validation-report/produce';
import { pageSizeSchema } from '@/lib/validations/review';
import { attachmentDisposition } from '@/lib/content-disposition';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const GET = withAuth<{ caseId: string }>(async ({ member, params, request }) => {
  const size = pageSizeSchema.parse((request.nextUrl.searchParams.get('size') ?? 'A4').toUpperCase());
  const { pdf, filename } = await validationReportPdf(member, params.caseId, size, request.signal);
  return new Response(new Uint8Array(pdf), {
    headers: {
      'content-type': 'application/pdf',
      'content-disposition': attachmentDisposition(filename),
      'cache-control': 'no-store',
    },
  });
}, operations.validationReport);
