// POST /api/v1/cases/{caseId}/observations/import – record a dated series of the project's value from a CSV or XLSX (multipart, field "file")
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { readUploadForm } from '@/lib/uploads/read-form';
import { recordObservationSeries } from '@/lib/watch/follow';
import { readObservationFile } from '@/lib/watch/import-observations';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth<{ caseId: string }>(async ({ member, params, request }) => {
  const recorded = await recordObservationSeries(member, params.caseId, async () => {
    const { file, bytes } = await readUploadForm(request, {
      what: 'the dated values',
      choose: 'Choose a CSV or XLSX file: dates in the first column, values in the second.',
    });
    return { points: await readObservationFile(file.name, bytes, request.signal), file: file.name };
  });
  return NextResponse.json(recorded, { status: 201 });
}, operations.importObservations);
