// POST /api/v1/valuations – value an engine model (stateless: nothing is stored); ?extras=false for one lattice pass, ?paths=true for every path's boundary
import { NextResponse } from 'next/server';
import { readJson, withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { EngineRefusal, valueInWorkerAsJson } from '@/lib/engine/pool';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';
export const runtime = 'nodejs';

export const POST = withAuth(async ({ member, request }) => {
  const input = await readJson(request);
  const extras = request.nextUrl.searchParams.get('extras') !== 'false';
  const paths = request.nextUrl.searchParams.get('paths') === 'true';
  try {
    const timing: { queueMs?: number; engineMs?: number } = {};
    const json = await valueInWorkerAsJson(input, { extras, paths }, { owner: member.userId, signal: request.signal, timing });
    // How long the job waited for a worker and ran in the engine: the rest of a response's time is the API's own.
    const serverTiming = `queue;dur=${(timing.queueMs ?? 0).toFixed(1)}, engine;dur=${(timing.engineMs ?? 0).toFixed(1)}`;
    return new NextResponse(json, { headers: { 'content-type': 'application/json', 'server-timing': serverTiming } });
  } catch (error) {
    if (error instanceof EngineRefusal) {
      const fields: Record<string, string[]> = {};
      for (const issue of error.issues) (fields[issue.field] ??= []).push(issue.message);
      throw new AppError('unprocessable', error.issues[0]?.message ?? 'The model is not valid.', fields);
    }
    throw error;
  }
}, operations.valueModel);
