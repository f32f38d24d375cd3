/**
 * Checks every answer against the OpenAPI document, as a middleware of the typed client
 * (openapi-fetch): a JSON answer must match the schema the document gives for its operation and
 * status (Ajv, JSON Schema 2020-12, the dialect of OpenAPI 3.1, with its date-time format); a
 * file must have the documented media type; an undocumented status fails. It also records which
 * operations answered 2xx, so a test can prove every operation was exercised.
 */
import Ajv2020 from 'ajv/dist/2020';
import addFormats from 'ajv-formats';
import type { Middleware } from 'openapi-fetch';

type Doc = {
  paths: Record<string, Record<string, { operationId: string; responses: Record<string, { content?: Record<string, { schema: object }> }> }>>;
  components: object;
};

export class Conformance {
  readonly problems: string[] = [];
  readonly succeeded = new Set<string>();
  private readonly ajv: Ajv2020;
  private readonly compiled = new Map<string, ReturnType<Ajv2020['compile']>>();

  constructor(private readonly doc: Doc) {
    // OpenAPI keywords (example, format: binary) are not JSON Schema's: not strict about them.
    this.ajv = new Ajv2020({ strict: false, allErrors: true });
    addFormats(this.ajv);
  }

  /** Every operation the document describes. */
  operationIds(): string[] {
    return Object.values(this.doc.paths).flatMap((item) => Object.values(item).map((o) => o.operationId));
  }

  /** Checks one answer of the operation at `pathTemplate` (as the document writes it). */
  async check(method: string, pathTemplate: string, response: Response): Promise<void> {
    const operation = this.doc.paths[pathTemplate]?.[method.toLowerCase()];
    const where = `${method} ${pathTemplate} → ${response.status}`;
    if (!operation) return void this.problems.push(`${where}: not in the document`);
    const documented = operation.responses[String(response.status)] ?? (response.status >= 400 ? operation.responses.default : undefined);
    if (!documented) return void this.problems.push(`${where}: status not documented`);
    if (response.ok) this.succeeded.add(operation.operationId);
    const type = (response.headers.get('content-type') ?? '').split(';')[0]!.trim();
    const content = documented.content;
    if (!content) {
      if ((await response.clone().arrayBuffer()).byteLength > 0) this.problems.push(`${where}: a body where none is documented`);
      return;
    }
    const media = content[type] ?? content['application/octet-stream'];
    if (!media) return void this.problems.push(`${where}: content-type ${type}, documented ${Object.keys(content).join(', ')}`);
    if (type !== 'application/json') return;
    const key = `${where} ${type}`;
    let validate = this.compiled.get(key);
    if (!validate) this.compiled.set(key, (validate = this.ajv.compile({ ...media.schema, components: this.doc.components })));
    const body = await response.clone().json();
    if (!validate(body)) this.problems.push(`${where}: ${this.ajv.errorsText(validate.errors, { separator: '; ' })}`);
  }

  middleware(): Middleware {
    return {
      onResponse: async ({ request, response, schemaPath }) => {
        await this.check(request.method, schemaPath, response);
        return undefined;
      },
    };
  }
}
