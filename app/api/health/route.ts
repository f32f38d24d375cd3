// GET /api/health – can the app reach its database, does the engine answer, and is the job queue worked? (no sign-in)
import { NextResponse } from 'next/server';
import { healthReport } from '@/lib/health';

export const dynamic = 'force-dynamic';

export async function GET() {
  const { healthy, report } = await healthReport();
  return NextResponse.json(report, { status: healthy ? 200 : 503, headers: { 'cache-control': 'no-store' } });
}
