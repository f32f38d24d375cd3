/**
 * No NaN or ±Infinity leaves the engine (docs/engine.md §8): the last check on every result.
 * A result holds thousands of numbers (a boundary and an exercise profile per step), so the walk
 * builds no path while it looks; the path of a bad number is spelled out only once one is found.
 */
import { ModelError } from './errors';

/** Throws a ModelError naming the first non-finite number in the result (errorEstimate may be NaN). */
export function assertFinite(result: unknown): void {
  const path = nonFinitePath(result, '');
  if (path !== null)
    throw new ModelError([{ field: 'model', message: `model produces a non-finite ${path.replace(/^\./, '')}; check the magnitudes of its inputs` }]);
}

/**
 * The path (`.rights[2].boundary[0].critical`) of the first NaN or ±Infinity in `value`, reached
 * under `name` (a key, or an index in an array), or null when every number is finite.
 */
export function nonFinitePath(value: unknown, name: string | number): string | null {
  if (typeof value === 'number') return Number.isFinite(value) || (name === 'errorEstimate' && Number.isNaN(value)) ? null : segment(name);
  if (value === null || typeof value !== 'object') return null;
  if (Array.isArray(value)) {
    for (let j = 0; j < value.length; j++) {
      const item: unknown = value[j];
      if (typeof item === 'number' && Number.isFinite(item)) continue; // the common case, no call
      const inner = nonFinitePath(item, j);
      if (inner !== null) return segment(name) + inner;
    }
    return null;
  }
  for (const key in value) {
    const inner = nonFinitePath((value as Record<string, unknown>)[key], key);
    if (inner !== null) return segment(name) + inner;
  }
  return null;
}

const segment = (name: string | number) => (typeof name === 'number' ? `[${name}]` : name === '' ? '' : `.${name}`);
