/**
 * The API's operations and its route files name the same methods and paths, one to one: every
 * `export const METHOD = withAuth(…, operations.NAME)` under app/api/v1 uses an operation whose
 * method and path are the file's, and no operation lacks a route. With the permission and body
 * schema read from the operation by lib/api.ts, the OpenAPI document cannot describe a route
 * other than the one that runs. The document itself is a valid OpenAPI 3.1 document
 * (@seriousme/openapi-schema-validator, the OpenAPI Initiative's published JSON Schema).
 */
import { Validator } from '@seriousme/openapi-schema-validator';
import { describe, expect, it } from 'vitest';
import { openApiDocument } from '@/lib/openapi/document';
import { operations } from '@/lib/openapi/operations';
import { routeExports } from '../support/route-files';

describe('the OpenAPI operations', () => {
  it('match the route files one to one', () => {
    const declared = Object.entries(operations)
      .map(([name, op]) => `${op.method.toUpperCase()} ${op.path} → ${name}`)
      .sort();
    const onDisk = routeExports().map(({ method, url, text }) => {
      const used = [...text.matchAll(/operations\.(\w+),?\s*\)/g)].map((u) => u[1]);
      return `${method} ${url.replace(/\[(\w+)\]/g, '{$1}')} → ${used.join(',') || 'no operation'}`;
    });
    expect(onDisk.sort()).toEqual(declared);
  });

  it('make a valid OpenAPI 3.1 document with every operation, both ways to authenticate and the error shape', async () => {
    const document = openApiDocument();
    const result = await new Validator().validate(JSON.parse(JSON.stringify(document)));
    expect(result.errors ?? []).toEqual([]);
    expect(result.valid).toBe(true);
    expect(document.openapi).toBe('3.1.0');
    const count = Object.values(document.paths ?? {}).reduce((n, item) => n + Object.keys(item ?? {}).length, 0);
    expect(count).toBe(Object.keys(operations).length);
    expect(Object.keys(document.components?.securitySchemes ?? {}).sort()).toEqual(['apiKey', 'session']);
    expect(document.components?.schemas?.Error).toBeDefined();
  });
});
