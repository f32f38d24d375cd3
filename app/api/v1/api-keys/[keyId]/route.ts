// DELETE /api/v1/api-keys/{keyId} – revoke a key (admins); it stops working at once
import { NextResponse } from 'next/server';
import { revokeKey } from '@/lib/api-keys/manage';
import { withAuth } from '@/lib/api';
import { operations } from '@/lib/openapi/operations';

export const dynamic = 'force-dynamic';

export const DELETE = withAuth<{ keyId: string }>(async ({ member, params }) => {
  await revokeKey(member, params.keyId);
  return new NextResponse(null, { status: 204 });
}, operations.revokeApiKey);
