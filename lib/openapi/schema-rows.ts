/**
 * A JSON Schema from the OpenAPI document, read out for people: one row per field (nested
 * objects as dotted names, two levels deep), with its type, whether it is required, and its
 * bounds and description in words. Used by the API reference page.
 */
type Schema = {
  $ref?: string;
  type?: string | string[];
  properties?: Record<string, Schema>;
  required?: string[];
  items?: Schema;
  enum?: unknown[];
  const?: unknown;
  anyOf?: Schema[];
  oneOf?: Schema[];
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
  minLength?: number;
  maxLength?: number;
  minItems?: number;
  maxItems?: number;
  default?: unknown;
  format?: string;
  description?: string;
};

export interface SchemaRow {
  name: string;
  type: string;
  required: boolean;
  notes: string;
}

type Components = { schemas?: Record<string, unknown> };

function resolve(schema: Schema, components: Components): Schema {
  let s = schema;
  for (let k = 0; s.$ref && k < 10; k++) s = (components.schemas?.[s.$ref.replace('#/components/schemas/', '')] ?? {}) as Schema;
  return s;
}

export function typeOf(schema: Schema, components: Components): string {
  const s = resolve(schema, components);
  if (s.const !== undefined) return JSON.stringify(s.const);
  if (s.enum) return s.enum.map((v) => JSON.stringify(v)).join(' | ');
  const options = s.anyOf ?? s.oneOf;
  if (options) return [...new Set(options.map((o) => typeOf(o, components)))].join(' or ');
  const types = Array.isArray(s.type) ? s.type : s.type ? [s.type] : [];
  const named = types.map((t) => (t === 'array' && s.items ? `array of ${typeOf(s.items, components)}` : t === 'string' && s.format === 'binary' ? 'file' : t));
  return named.join(' or ') || 'any';
}

function bounds(s: Schema): string[] {
  const out: string[] = [];
  const range = (lo?: number, loOpen?: number, hi?: number, hiOpen?: number, unit = '') => {
    const parts: string[] = [];
    if (lo !== undefined) parts.push(`≥ ${lo}${unit}`);
    if (loOpen !== undefined) parts.push(`> ${loOpen}${unit}`);
    if (hi !== undefined) parts.push(`≤ ${hi}${unit}`);
    if (hiOpen !== undefined) parts.push(`< ${hiOpen}${unit}`);
    return parts.join(', ');
  };
  const numeric = range(s.minimum, s.exclusiveMinimum, s.maximum, s.exclusiveMaximum);
  if (numeric) out.push(numeric);
  const length = range(s.minLength, undefined, s.maxLength, undefined, ' characters');
  if (length) out.push(length);
  const items = range(s.minItems, undefined, s.maxItems, undefined, ' items');
  if (items) out.push(items);
  if (s.default !== undefined) out.push(`default ${JSON.stringify(s.default)}`);
  return out;
}

export function schemaRows(schema: Schema | undefined, components: Components, depth = 2, prefix = ''): SchemaRow[] {
  if (!schema) return [];
  const s = resolve(schema, components);
  const rows: SchemaRow[] = [];
  for (const [name, raw] of Object.entries(s.properties ?? {})) {
    const field = resolve(raw, components);
    const full = prefix + name;
    rows.push({
      name: full,
      type: typeOf(raw, components),
      required: (s.required ?? []).includes(name),
      notes: [field.description ?? raw.description, ...bounds(field)].filter(Boolean).join('; '),
    });
    if (depth > 1 && field.properties) rows.push(...schemaRows(field, components, depth - 1, `${full}.`));
    else if (depth > 1 && field.items && resolve(field.items, components).properties)
      rows.push(...schemaRows(field.items, components, depth - 1, `${full}[].`));
  }
  return rows;
}
