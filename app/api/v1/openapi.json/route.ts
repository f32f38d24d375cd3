// GET /api/v1/openapi.json – the OpenAPI 3.1 description of this API, generated from the operations the routes run with
import { NextResponse } from 'next/server';
import { withAuth } from '@/lib/api';
import { openApiDocument } from '@/lib/openapi/document';
import { operations } from '@/lib/openapi/operations';

export const dynamic = 'force-dynamic';

export const GET = withAuth(async () => NextResponse.json(openApiDocument()), operations.openApiDocument);
