// GET /api/v1/compare?cases=a,b[,c,d] – two to four cases side by side: figures, options and assumptions
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';
import { compareCases } from '@/lib/comparison';
import { compareQuerySchema } from '@/lib/validations/compare';

export const dynamic = 'force-dynamic';

export const GET = withAuth(
  async ({ member, request }) =>
    NextResponse.json(await compareCases(member.orgId, compareQuerySchema.parse(request.nextUrl.searchParams.get('cases') ?? undefined))),
  operations.compareCases,
);
