// GET /api/v1/cases – every case of the organisation with its project (for pickers such as the compare page)
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { listCases } from '@/lib/cases/service';
import { operations } from '@/lib/openapi/operations';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async ({ member }) => NextResponse.json({ cases: await listCases(member) }), operations.listCases);
