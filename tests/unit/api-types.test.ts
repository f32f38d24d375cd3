/**
 * The TypeScript types of the API (types/leeway-api.d.ts) are generated from the OpenAPI document
 * by openapi-typescript and checked in, so the typed client in tests/e2e/api-client.test.ts
 * compiles against the document. This test regenerates them and fails when the checked-in file
 * differs: run `npm run api:types` after changing an operation or a schema.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import openapiTS, { astToString } from 'openapi-typescript';
import { describe, expect, it } from 'vitest';
import { openApiDocument } from '@/lib/openapi/document';

const FILE = 'types/leeway-api.d.ts';
const HEADER = '// Generated from GET /api/v1/openapi.json by openapi-typescript (npm run api:types). Do not edit.\n';

describe('types/leeway-api.d.ts', () => {
  it('is what openapi-typescript generates from the document now', async () => {
    const generated = HEADER + astToString(await openapiTS(JSON.parse(JSON.stringify(openApiDocument()))));
    if (process.env.UPDATE_API_TYPES === '1') writeFileSync(FILE, generated);
    expect(readFileSync(FILE, 'utf8')).toBe(generated);
  });
});
