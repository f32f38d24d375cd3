/**
 * A re-run's report of what moved (lib/run-changes.ts), and the result hash it rests on: the
 * hash is the same for a result and for the copy PostgreSQL's jsonb hands back with its keys in
 * another order; any changed figure changes it.
 */
import { describe, expect, it } from 'vitest';
import { valueProject } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { caseToModel } from '@/lib/case-model';
import { hashResult } from '@/lib/model-hash';
import { figureChanges, partsThatDiffer } from '@/lib/run-changes';

const plant = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
const result = valueProject(caseToModel(plant).model);

/** The result with every object's keys in reverse order, as a database may hand it back. */
function reordered(x: unknown): unknown {
  if (Array.isArray(x)) return x.map(reordered);
  if (x && typeof x === 'object')
    return Object.fromEntries(
      Object.entries(x)
        .reverse()
        .map(([k, v]) => [k, reordered(v)]),
    );
  return x;
}

describe('result hashes and what moved', () => {
  it('hash the same figures the same, whatever the key order, and a valuation twice the same', () => {
    expect(hashResult(reordered(JSON.parse(JSON.stringify(result))))).toBe(hashResult(result));
    expect(hashResult(valueProject(caseToModel(plant).model))).toBe(hashResult(result));
  });

  it('name nothing for the same result, and each moved figure with its change', () => {
    expect(figureChanges(result, structuredClone(result))).toEqual([]);
    expect(partsThatDiffer(result, structuredClone(result))).toEqual([]);
    const moved = structuredClone(result);
    moved.expandedNpv += 0.25;
    moved.rights[0]!.exerciseProbability = 0.5;
    moved.rights[0]!.boundary = [];
    expect(hashResult(moved)).not.toBe(hashResult(result));
    const changes = figureChanges(result, moved);
    expect(changes.map((c) => c.figure)).toEqual(['Expanded NPV', `${result.rights[0]!.id}: probability of use`]);
    expect(changes[0]!.change).toBeCloseTo(0.25, 12);
    expect(partsThatDiffer(result, moved)).toEqual(['expandedNpv', 'rights']);
    // A run stored before leeway-lattice 3.0.0 lists its rights under `switches`: read in today's shape, nothing else differs.
    const { rights, ...rest } = structuredClone(result);
    const stored = { ...rest, switches: rights };
    expect(partsThatDiffer(stored, result)).toEqual([]);
    expect(figureChanges(stored, moved).map((c) => c.figure)).toEqual(['Expanded NPV', `${result.rights[0]!.id}: probability of use`]);
  });
});
