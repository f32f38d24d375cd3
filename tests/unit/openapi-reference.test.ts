/**
 * What the API reference page reads out of the OpenAPI document: field rows with types, bounds
 * and required marks, $refs followed; and an example request per operation that carries the key
 * only as an environment variable, puts the path ids as placeholders and sends the operation's
 * example body, which its own schema accepts.
 */
import { describe, expect, it } from 'vitest';
import { exampleRequest } from '@/lib/openapi/example-request';
import { operations } from '@/lib/openapi/operations';
import { schemaRows, typeOf } from '@/lib/openapi/schema-rows';

describe('schemaRows', () => {
  const components = { schemas: { Money: { type: 'number', description: 'In the currency.' } } };
  it('reads fields, nested fields, bounds, defaults and references', () => {
    const rows = schemaRows(
      {
        type: 'object',
        required: ['name'],
        properties: {
          name: { type: 'string', minLength: 1, maxLength: 80 },
          role: { type: 'string', enum: ['analyst', 'viewer'] },
          rate: { type: 'number', exclusiveMinimum: 0, maximum: 3, default: 0.3 },
          amount: { $ref: '#/components/schemas/Money' },
          rows: { type: 'array', items: { type: 'object', properties: { year: { type: 'integer' } } } },
        },
      },
      components,
    );
    expect(rows).toEqual([
      { name: 'name', type: 'string', required: true, notes: '≥ 1 characters, ≤ 80 characters' },
      { name: 'role', type: '"analyst" | "viewer"', required: false, notes: '' },
      { name: 'rate', type: 'number', required: false, notes: '> 0, ≤ 3; default 0.3' },
      { name: 'amount', type: 'number', required: false, notes: 'In the currency.' },
      { name: 'rows', type: 'array of object', required: false, notes: '' },
      { name: 'rows[].year', type: 'integer', required: false, notes: '' },
    ]);
  });
  it('names unions and files', () => {
    expect(typeOf({ anyOf: [{ type: 'string' }, { type: 'null' }] }, components)).toBe('string or null');
    expect(typeOf({ type: 'string', format: 'binary' }, components)).toBe('file');
  });
});

describe('exampleRequest', () => {
  it('uses the key from the environment, placeholders for ids and the example body', () => {
    expect(exampleRequest(operations.returnCase, 'https://leeway.example/')).toBe(
      [
        'curl -X POST "https://leeway.example/api/v1/cases/<caseId>/return"',
        '  -H "Authorization: Bearer $LEEWAY_API_KEY"',
        '  -H "Content-Type: application/json"',
        `  --data '${JSON.stringify(operations.returnCase.example)}'`,
      ].join(' \\\n'),
    );
    expect(exampleRequest(operations.exportCase, 'https://leeway.example')).toContain('-o "<file>"');
    expect(exampleRequest(operations.addAttachment, 'https://leeway.example')).toContain('-F "file=@<file>"');
  });

  it.each(Object.entries(operations).filter(([, op]) => 'example' in op))('sends an example body its schema accepts: %s', (_, op) => {
    const schema = 'body' in op && op.body ? op.body : undefined;
    expect(schema?.safeParse((op as { example: unknown }).example).success).toBe(true);
  });

  it('gives an example body to every operation with a JSON body', () => {
    expect(Object.entries(operations).filter(([, op]) => 'body' in op && op.body && !('example' in op))).toEqual([]);
  });
});
