/**
 * Decision rules in words, from a right's exercise boundary: "Expand Phase 2 between years 2.0
 * and 4.0 when the project is worth more than 240 (year 2.0) to 265 (year 4.0)". Rights that
 * add scale or start the project (expand, defer, stage, restart) are used when the value is
 * high, the others (abandon, contract, mothball) when it is low; the threshold is the boundary's
 * edge on that side. Shared by the results page and the board pack.
 */
import type { BoundaryPoint, SwitchResult } from '@/lattice';
import { formatMoney } from './format';

const usedWhenHigh = new Set(['expand', 'defer', 'stage']);

export interface DecisionRule {
  right: string;
  kind: string;
  /** 'above': exercised when the value is at least the threshold; 'below': at most. */
  side: 'above' | 'below';
  first: { t: number; threshold: number } | null;
  last: { t: number; threshold: number } | null;
  text: string;
}

const years = (t: number) => (Math.abs(t - Math.round(t)) < 1e-9 ? String(Math.round(t)) : t.toFixed(1));

export function decisionRule(s: Pick<SwitchResult, 'id' | 'kind' | 'boundary' | 'exerciseProbability'>, currency?: string): DecisionRule {
  const side: DecisionRule['side'] = usedWhenHigh.has(s.kind) ? 'above' : 'below';
  const edge = (b: BoundaryPoint) => (side === 'above' ? b.low : b.high);
  const points = s.boundary.filter((b) => edge(b) !== null).map((b) => ({ t: b.t, threshold: edge(b)! }));
  const first = points[0] ?? null;
  const last = points.at(-1) ?? null;
  const verb = { expand: 'Expand', contract: 'Contract', abandon: 'Abandon', defer: 'Invest', stage: 'Pay the stage', switch: 'Switch' }[s.kind] ?? 'Exercise';
  if (!first || !last || s.exerciseProbability === 0)
    return { right: s.id, kind: s.kind, side, first: null, last: null, text: `${s.id}: never exercised on this lattice; it adds no value as specified.` };
  const comparison = side === 'above' ? 'is worth more than' : 'is worth less than';
  const span = first.t === last.t ? `in year ${years(first.t)}` : `between years ${years(first.t)} and ${years(last.t)}`;
  const level =
    Math.abs(first.threshold - last.threshold) < 0.005 * Math.max(1, Math.abs(first.threshold))
      ? formatMoney(first.threshold, currency)
      : `${formatMoney(first.threshold, currency)} (year ${years(first.t)}) to ${formatMoney(last.threshold, currency)} (year ${years(last.t)})`;
  return { right: s.id, kind: s.kind, side, first, last, text: `${verb} (${s.id}) ${span} when the project ${comparison} ${level}.` };
}
