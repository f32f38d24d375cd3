/**
 * What moved between a stored run's result and a re-run of its model: the headline figures and
 * each right's figures that differ (any difference: a re-run either reproduces to the bit or it
 * does not), and which parts of the result differ at all (boundaries, timing, convergence…).
 */
import canonicalize from 'canonicalize';
import { readStoredResult } from '@/lattice';

export interface FigureChange {
  figure: string;
  stored: number | null;
  now: number | null;
  /** now − stored, when both are numbers. */
  change: number | null;
}

type Result = Record<string, unknown> & {
  rights?: { id: string; standalone?: number | null; incremental?: number | null; exerciseProbability?: number }[];
  premiumSplit?: { betterPlan: number; uncertainty: number } | null;
};

const num = (x: unknown): number | null => (typeof x === 'number' && Number.isFinite(x) ? x : null);

export function figureChanges(storedResult: unknown, nowResult: unknown): FigureChange[] {
  const stored = readStoredResult(storedResult) as unknown as Result;
  const now = readStoredResult(nowResult) as unknown as Result;
  const pairs: [string, unknown, unknown][] = [
    ['Project value (V0)', stored.value, now.value],
    ['Static NPV', stored.staticNpv, now.staticNpv],
    ['Option premium', stored.optionPremium, now.optionPremium],
    ['Expanded NPV', stored.expandedNpv, now.expandedNpv],
    ['Interaction', stored.interaction, now.interaction],
    ['Premium: better plan', stored.premiumSplit?.betterPlan, now.premiumSplit?.betterPlan],
    ['Premium: flexibility', stored.premiumSplit?.uncertainty, now.premiumSplit?.uncertainty],
  ];
  const ids = new Set([...(stored.rights ?? []), ...(now.rights ?? [])].map((s) => s.id));
  for (const id of ids) {
    const a = stored.rights?.find((s) => s.id === id);
    const b = now.rights?.find((s) => s.id === id);
    pairs.push([`${id}: stand-alone value`, a?.standalone, b?.standalone]);
    pairs.push([`${id}: incremental value`, a?.incremental, b?.incremental]);
    pairs.push([`${id}: probability of use`, a?.exerciseProbability, b?.exerciseProbability]);
  }
  return pairs
    .map(([figure, a, b]) => ({ figure, stored: num(a), now: num(b), change: num(a) !== null && num(b) !== null ? num(b)! - num(a)! : null }))
    .filter((c) => c.stored !== c.now);
}

/** The result's top-level parts whose content differs (in canonical JSON). */
export function partsThatDiffer(storedResult: unknown, nowResult: unknown): string[] {
  const stored = readStoredResult(storedResult) as unknown as Record<string, unknown>;
  const now = readStoredResult(nowResult) as unknown as Record<string, unknown>;
  return [...new Set([...Object.keys(stored), ...Object.keys(now)])].filter((k) => canonicalize(stored[k]) !== canonicalize(now[k])).sort();
}
