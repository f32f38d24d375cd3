// POST /api/v1/volatility/history – annualised volatility of log returns from an uploaded CSV or XLSX, or JSON { series }
import { NextResponse } from 'next/server';
import { readJson, withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { readUploadForm } from '@/lib/uploads/read-form';
import { historyJsonSchema } from '@/lib/validations/volatility';
import { AppError } from '@/lib/errors';
import { inspectUpload } from '@/lib/uploads/inspect';
import { estimateFromHistory, HistoryError, type HistoryPoint } from '@/lib/volatility/history';
import { readSeriesUpload } from '@/lib/uploads/read-in-thread';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

async function seriesFrom(request: Request): Promise<{ series: HistoryPoint[]; source: string }> {
  const type = request.headers.get('content-type') ?? '';
  if (type.startsWith('multipart/form-data')) {
    const { file, bytes } = await readUploadForm(request, { what: 'the history', choose: 'Choose a CSV or XLSX file.' });
    const kind = inspectUpload(file.name, bytes, ['csv', 'xlsx']);
    const placed = await readSeriesUpload(kind, bytes, request.signal);
    return { series: placed.map(({ date, value }) => ({ date, value })), source: file.name };
  }
  return { series: historyJsonSchema.parse(await readJson(request)).series, source: 'series sent as JSON' };
}

export const POST = withAuth(async ({ request }) => {
  try {
    const { series, source } = await seriesFrom(request);
    const estimate = estimateFromHistory(series);
    return NextResponse.json({ source, ...estimate });
  } catch (error) {
    if (error instanceof HistoryError) throw new AppError('unprocessable', error.message, { series: [error.message] });
    throw error;
  }
}, operations.volatilityFromHistory);
