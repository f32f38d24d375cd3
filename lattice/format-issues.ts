/**
 * Turns zod's issues into the engine's one-line refusals: the dotted field path, the rule, and
 * the value that broke it (`underlying.volatility must be > 0, got -0.2`).
 */
import type { z } from 'zod';
import type { ModelIssue } from './errors';
import { optionTemplateSchema } from './schema';

/** The kinds of right a template may name, read from the schema so the refusal lists them all. */
const rightKinds = optionTemplateSchema.options.map((o) => JSON.stringify(o.shape.kind.value)).join(', ');

export function fieldPath(path: ReadonlyArray<PropertyKey>): string {
  let out = '';
  for (const key of path) {
    if (typeof key === 'number') out += `[${key}]`;
    else out += out === '' ? String(key) : `.${String(key)}`;
  }
  return out === '' ? 'model' : out;
}

export function describeValue(value: unknown): string {
  if (typeof value === 'number') return Number.isNaN(value) ? 'NaN' : String(value);
  if (typeof value === 'string') return JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value);
  if (value === null) return 'null';
  if (value === undefined) return 'nothing';
  if (Array.isArray(value)) return 'a list';
  return typeof value === 'object' ? 'an object' : typeof value;
}

const moneyOverTime = 'must be a number, {amount, growth} or a schedule [{from, amount}, …]';

function rule(issue: z.core.$ZodIssue): string {
  const got = 'input' in issue ? `, got ${describeValue(issue.input)}` : '';
  switch (issue.code) {
    case 'invalid_type':
      if (issue.expected === 'int') return `must be a whole number${got}`;
      if (issue.input === undefined) return 'is required';
      return `must be ${issue.expected === 'array' ? 'a list' : `a ${issue.expected}`}${got}`;
    case 'too_small': {
      if (issue.origin === 'array') return `must have at least ${issue.minimum} item(s)`;
      if (issue.origin === 'string') return 'must not be empty';
      return `must be ${issue.inclusive ? '≥' : '>'} ${issue.minimum}${got}`;
    }
    case 'too_big': {
      if (issue.origin === 'array') return `must have at most ${issue.maximum} item(s)`;
      if (issue.origin === 'string') return `must be at most ${issue.maximum} characters`;
      return `must be ${issue.inclusive ? '≤' : '<'} ${issue.maximum}${got}`;
    }
    case 'invalid_value':
      return `must be one of ${issue.values.map((v) => JSON.stringify(v)).join(', ')}${got}`;
    case 'unrecognized_keys':
      return `has unknown field(s) ${issue.keys.join(', ')}`;
    case 'invalid_union': {
      const key = issue.path[issue.path.length - 1];
      if (key === 'cost' || key === 'salvage' || key === 'savings' || key === 'backCost') return `${moneyOverTime}${got}`;
      if (key === 'window') return `must be {kind: "american", from, to}, {kind: "bermudan", dates} or {kind: "european", at}`;
      // zod reports a bad discriminator with the whole object as its input; name the kind given.
      const gotKind = issue.input && typeof issue.input === 'object' ? `, got ${describeValue((issue.input as { kind?: unknown }).kind)}` : got;
      if (key === 'kind' && issue.path.at(-2) === 'window') return `must be one of "american", "bermudan", "european"${gotKind}`;
      if (key === 'kind') return `must be one of ${rightKinds}${gotKind}`;
      return `${issue.message}${got}`;
    }
    default:
      return `${issue.message}${got}`;
  }
}

export function formatIssues(error: z.ZodError): ModelIssue[] {
  return error.issues.map((issue) => {
    const field = fieldPath(issue.path);
    return { field, message: `${field} ${rule(issue)}` };
  });
}
