import type { Metadata } from 'next';
import Link from 'next/link';
import { CopyButton } from '@/components/copy-button';
import { PageHeader } from '@/components/page-header';
import { Table, Td, Th, Tr } from '@/components/ui/table';
import { ValuationCaution } from '@/components/valuation-caution';
import { API_KEY_REQUESTS_PER_MINUTE } from '@/lib/api-keys/limits';
import { openApiDocument, rolesOf } from '@/lib/openapi/document';
import { exampleRequest } from '@/lib/openapi/example-request';
import type { Operation, Tag } from '@/lib/openapi/operation';
import { operations } from '@/lib/openapi/operations';
import { schemaRows, typeOf, type SchemaRow } from '@/lib/openapi/schema-rows';
import { guardPage } from '@/lib/page-guard';

export const metadata: Metadata = { title: 'API reference' };

const methodStyle: Record<Operation['method'], string> = {
  get: 'bg-tide-50 text-tide-700',
  post: 'bg-ember-100 text-ember-700',
  patch: 'bg-paper-sunk text-ink',
  delete: 'bg-brick-100 text-brick-700',
};

const anchor = (tag: string) => `tag-${tag.toLowerCase().replace(/\W+/g, '-')}`;

function Fields({ rows, caption }: { rows: SchemaRow[]; caption: string }) {
  if (rows.length === 0) return null;
  return (
    <Table caption={caption}>
      <thead>
        <tr>
          <Th>Field</Th>
          <Th>Type</Th>
          <Th>Notes</Th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <Tr key={r.name}>
            <Td>
              <code className="font-mono text-caption">{r.name}</code>
              {r.required ? <span className="ml-1 text-caption text-brick-700">required</span> : null}
            </Td>
            <Td>
              <span className="font-mono text-caption">{r.type}</span>
            </Td>
            <Td>
              <span className="text-caption text-ink-soft">{r.notes}</span>
            </Td>
          </Tr>
        ))}
      </tbody>
    </Table>
  );
}

export default async function ApiReferencePage() {
  const member = await guardPage();
  if (member === 'forbidden') return null;
  const document = openApiDocument();
  const components = (document.components ?? {}) as { schemas?: Record<string, unknown> };
  const baseUrl = process.env.APP_URL ?? 'http://127.0.0.1:3000';
  const byTag = new Map<Tag, [string, Operation][]>();
  for (const [name, op] of Object.entries(operations) as [string, Operation][]) byTag.set(op.tag, [...(byTag.get(op.tag) ?? []), [name, op]]);
  type Described = {
    parameters?: { in: string; name: string; required?: boolean; description?: string; schema?: object }[];
    requestBody?: { content: Record<string, { schema: object }> };
  };
  const path = (op: Operation) => (document.paths?.[op.path] as Record<string, Described>)[op.method]!;
  return (
    <>
      <PageHeader
        title="API reference"
        lead="Every operation of Leeway's API, generated from the same schemas the server validates with. Feed Leeway from planning systems and read its figures into BI tools."
      />
      <section aria-labelledby="api-basics" className="mb-10 grid gap-4 lg:grid-cols-3">
        <h2 id="api-basics" className="sr-only">
          Basics
        </h2>
        <div className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <h3 className="text-body font-semibold">Authenticate</h3>
          <p className="mt-2 text-caption text-ink-soft">
            Send an organisation API key as <code className="font-mono">Authorization: Bearer lwk_…</code>. It acts with the role it was given. Admins create
            keys in{' '}
            <Link href="/settings/api-keys" className="text-tide-600 underline">
              Settings → API keys
            </Link>
            . A key in a URL is refused.
          </p>
        </div>
        <div className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <h3 className="text-body font-semibold">Errors and limits</h3>
          <p className="mt-2 text-caption text-ink-soft">
            Every error answers <code className="font-mono">{'{ error: { code, message, fields? } }'}</code> with a 4xx or 5xx status. A key may make{' '}
            {API_KEY_REQUESTS_PER_MINUTE} requests a minute; past that it gets 429 with Retry-After.
          </p>
        </div>
        <div className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
          <h3 className="text-body font-semibold">The document</h3>
          <p className="mt-2 text-caption text-ink-soft">
            The OpenAPI 3.1 document is at{' '}
            <a href="/api/v1/openapi.json" className="text-tide-600 underline">
              /api/v1/openapi.json
            </a>{' '}
            for code generators and API tools. {Object.keys(operations).length} operations.
          </p>
        </div>
      </section>
      <div className="flex gap-8">
        <nav aria-label="API sections" className="sticky top-8 hidden w-48 shrink-0 self-start xl:block">
          <ul className="flex flex-col gap-1 text-caption">
            {[...byTag.keys()].map((tag) => (
              <li key={tag}>
                <a href={`#${anchor(tag)}`} className="text-tide-600 hover:underline">
                  {tag}
                </a>
              </li>
            ))}
          </ul>
        </nav>
        <div className="flex min-w-0 flex-1 flex-col gap-10">
          {[...byTag.entries()].map(([tag, ops]) => (
            <section key={tag} aria-labelledby={anchor(tag)}>
              <h2 id={anchor(tag)} className="mb-4">
                {tag}
              </h2>
              <div className="flex flex-col gap-6">
                {ops.map(([name, op]) => {
                  const described = path(op);
                  const jsonBody = described.requestBody?.content['application/json']?.schema ?? described.requestBody?.content['multipart/form-data']?.schema;
                  const success = Object.entries(op.answers);
                  const queryRows: SchemaRow[] = (described.parameters ?? [])
                    .filter((p) => p.in === 'query')
                    .map((p) => ({ name: p.name, type: typeOf(p.schema as never, components), required: !!p.required, notes: p.description ?? '' }));
                  const example = exampleRequest(op, baseUrl);
                  return (
                    <article key={name} id={name} aria-labelledby={`${name}-title`} className="rounded-card border border-line bg-paper-raised p-5 shadow-card">
                      <h3 id={`${name}-title`} className="text-body font-semibold">
                        {op.summary}
                      </h3>
                      <p className="mt-2 flex flex-wrap items-center gap-2">
                        <span className={`rounded px-2 py-0.5 font-mono text-caption font-semibold uppercase ${methodStyle[op.method]}`}>{op.method}</span>
                        <code className="break-all font-mono text-caption">{op.path}</code>
                      </p>
                      {op.description ? <p className="mt-2 max-w-prose text-caption text-ink-soft">{op.description}</p> : null}
                      <p className="mt-2 text-caption text-ink-muted">Roles: {rolesOf(op).join(', ')}</p>
                      {queryRows.length > 0 ? (
                        <div className="mt-3">
                          <p className="mb-1 text-caption font-medium uppercase tracking-wide text-ink-soft">Query</p>
                          <Fields caption={`Query parameters of ${op.summary}`} rows={queryRows} />
                        </div>
                      ) : null}
                      {jsonBody ? (
                        <div className="mt-3">
                          <p className="mb-1 text-caption font-medium uppercase tracking-wide text-ink-soft">
                            Body{op.otherBody ? ` (${op.otherBody.contentType})` : ''}
                          </p>
                          <Fields caption={`Body of ${op.summary}`} rows={schemaRows(jsonBody as never, components)} />
                        </div>
                      ) : null}
                      <p className="mt-3 text-caption text-ink-soft">
                        Answers:{' '}
                        {success.map(([status, answer]) => (
                          <span key={status}>
                            <strong>{status}</strong> {answer.description}{' '}
                          </span>
                        ))}
                        Errors in the one error shape.
                      </p>
                      <div className="mt-3 rounded-md border border-line bg-paper-sunk">
                        <div className="flex items-center justify-between border-b border-line px-3 py-1">
                          <span className="text-caption text-ink-muted">Example request</span>
                          <CopyButton text={example} label={`Copy the example request: ${op.summary}`} />
                        </div>
                        <pre className="overflow-x-auto px-3 py-2 font-mono text-caption" tabIndex={0} aria-label={`Example request: ${op.summary}`}>
                          {example}
                        </pre>
                      </div>
                    </article>
                  );
                })}
              </div>
            </section>
          ))}
        </div>
      </div>
      <div className="mt-10">
        <ValuationCaution />
      </div>
    </>
  );
}
