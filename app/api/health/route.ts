// GET /api/health – is the app up and can it reach its database?
import { sql } from 'kysely';
import { NextResponse } from 'next/server';
import { db } from '@/db';
import { ENGINE_VERSION } from '@/lattice';

export const dynamic = 'force-dynamic';

export async function GET() {
  const started = performance.now();
  try {
    await sql`select 1`.execute(db);
    return NextResponse.json({ status: 'ok', database: 'ok', databaseMs: Math.round(performance.now() - started), engineVersion: ENGINE_VERSION });
  } catch {
    return NextResponse.json({ status: 'degraded', database: 'unreachable' }, { status: 503 });
  }
}
