/**
 * Comparison helpers whose failures print every input, the expected and computed values, the
 * error and the tolerance, so a red test says exactly which reference row broke.
 */
import { expect } from 'vitest';

export function expectClose(computed: number, expected: number, tolerance: { abs?: number; rel?: number }, context: Record<string, unknown>): void {
  const error = Math.abs(computed - expected);
  const allowed = Math.max(tolerance.abs ?? 0, (tolerance.rel ?? 0) * Math.abs(expected));
  if (!(error <= allowed)) {
    const detail = JSON.stringify({ ...context, expected, computed, error, allowed, tolerance });
    expect.fail(`value outside tolerance: ${detail}`);
  }
}
