// GET /api/v1/api-keys – the organisation's API keys (admins); POST – create one, its secret shown once
import { NextResponse } from 'next/server';
import { createKey, listKeys } from '@/lib/api-keys/manage';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async ({ member }) => NextResponse.json({ apiKeys: await listKeys(member) }), operations.listApiKeys);

export const POST = withAuth(async ({ member, body }) => NextResponse.json(await createKey(member, body), { status: 201 }), operations.createApiKey);
