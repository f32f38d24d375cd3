/**
 * Decision rules in words, from a right's exercise boundary as the engine returns it: "Expand
 * (Phase 2) between years 2 and 4 when the project is worth more than 240.0 (year 2) to 265.5
 * (year 4)", then one sentence for each decision the first use leads to ("Pay the stage (Pilot
 * funding, payment 2) in year 1 when …", "Restart (Mothball) …"). The engine says on which side
 * of its critical value each step's region lies; this module only words and formats it. Shared
 * by the results page, the workbook and the board pack, so all three print the same rule for the
 * same run.
 *
 * Results stored by engine 1.x carry only the exercised nodes' range (`low`, `high`), not the
 * side: for those the side follows the right's kind (rights that add scale or start the project
 * are used when the value is high), as it did then.
 */
import type { BoundaryPoint, OptionTemplate, RightResult } from '@/lattice';
import { formatMoney } from './format';

type Side = 'above' | 'below' | 'between';

/** One decision's boundary read and worded. */
export interface RuleReading {
  /** 'above': used when the value is at least the threshold; 'below': at most; 'between': inside a band from it. */
  side: Side;
  /** The critical value at each step where the decision is taken on that side. */
  points: { t: number; threshold: number }[];
  first: { t: number; threshold: number } | null;
  last: { t: number; threshold: number } | null;
  text: string;
}

export interface DecisionRule extends RuleReading {
  right: string;
  kind: string;
  /** The decisions the first use leads to, each read and worded (a stage right's later payments, a mothball right's restart). */
  followUps: RuleReading[];
}

const usedWhenHigh = new Set(['expand', 'defer', 'stage']);
/** Every kind of right has its verb: a kind added to the engine without one does not compile. */
const verbs: Record<OptionTemplate['kind'], string> = {
  expand: 'Expand',
  contract: 'Contract',
  abandon: 'Abandon',
  defer: 'Invest',
  stage: 'Pay the stage',
  mothball: 'Mothball',
};
/** The verb of what follows a first use; one-shot rights have none. */
const followUpVerbs: Partial<Record<OptionTemplate['kind'], string>> = { stage: 'Pay the stage', mothball: 'Restart' };
const years = (t: number) => (Math.abs(t - Math.round(t)) < 1e-9 ? String(Math.round(t)) : t.toFixed(1));

/** The engine's side and critical value, or the engine 1.x reading of the same point. */
function located(point: BoundaryPoint, kind: string): { side: Side | 'anywhere'; critical: number | null } {
  if (point.side) return { side: point.side, critical: point.critical };
  const side = usedWhenHigh.has(kind) ? 'above' : 'below';
  return { side, critical: side === 'above' ? point.low : point.high };
}

/**
 * The action: the verb, then the right's name in brackets when it says more than the verb. A card
 * left with its kind's name read "Expand (Expand) between years 1 and 4 …".
 */
const action = (verb: string, name: string) => (name.trim().toLowerCase() === verb.toLowerCase() ? verb : `${verb} (${name})`);

export function decisionRule(s: Pick<RightResult, 'id' | 'kind' | 'boundary' | 'exerciseProbability' | 'followUps'>, currency?: string): DecisionRule {
  const verb = verbs[s.kind as OptionTemplate['kind']] ?? 'Exercise';
  const rule = ruleFor(s.boundary, s.kind, action(verb, s.id), currency);
  if (s.exerciseProbability === 0 || s.boundary.length === 0)
    return { right: s.id, kind: s.kind, ...rule, followUps: [], text: `${s.id}: never exercised on this lattice; it adds no value as specified.` };
  return { right: s.id, kind: s.kind, ...rule, followUps: followUpRules(s, currency) };
}

/** The decisions the first use leads to (engine 4.2.0 on): a stage right's later payments, a mothball right's restart. */
function followUpRules(s: Pick<RightResult, 'id' | 'kind' | 'followUps'>, currency?: string): RuleReading[] {
  return (s.followUps ?? []).map((f, k) => {
    const name = s.kind === 'stage' ? `${s.id}, payment ${k + 2}` : s.id;
    const rule = ruleFor(f.boundary, s.kind, action(followUpVerbs[s.kind as OptionTemplate['kind']] ?? 'Then', name), currency);
    if (f.boundary.length === 0) return { ...rule, text: `${name}: ${s.kind === 'stage' ? 'never paid' : 'never used'} on this lattice.` };
    return rule;
  });
}

/** One boundary in words: "<action> between years a and b when the project is worth more than …". */
function ruleFor(boundary: BoundaryPoint[], kind: string, action: string, currency?: string): RuleReading {
  const read = boundary.map((b) => ({ t: b.t, ...located(b, kind) }));
  const sides = read.filter((p) => p.side !== 'anywhere' && p.critical !== null);
  const side: Side = (sides[0]?.side as Side | undefined) ?? (usedWhenHigh.has(kind) ? 'above' : 'below');
  const points = sides.filter((p) => p.side === side).map((p) => ({ t: p.t, threshold: p.critical! }));
  const first = points[0] ?? null;
  const last = points.at(-1) ?? null;
  const span = (a: number, b: number) => (a === b ? `in year ${years(a)}` : `between years ${years(a)} and ${years(b)}`);
  if (!first || !last) return { side, points, first, last, text: `${action} ${span(read[0]?.t ?? 0, read.at(-1)?.t ?? 0)} whatever the project is worth.` };
  const comparison = { above: 'is worth more than', below: 'is worth less than', between: 'is worth more than' }[side];
  const level =
    Math.abs(first.threshold - last.threshold) < 0.005 * Math.max(1, Math.abs(first.threshold))
      ? formatMoney(first.threshold, currency)
      : `${formatMoney(first.threshold, currency)} (year ${years(first.t)}) to ${formatMoney(last.threshold, currency)} (year ${years(last.t)})`;
  const band = side === 'between' ? ', up to a ceiling above which it waits' : '';
  return {
    side,
    points,
    first,
    last,
    text: `${action} ${span(first.t, last.t)} when the project ${comparison} ${level}${band}${inBetween(points, currency)}.`,
  };
}

/**
 * The threshold's lowest or highest value when it lies well outside the range its first and last
 * values span: a rule read from its ends alone would hide it. The demo plant's sale is worth
 * taking below 12.8 in year 2.2 and 35.0 in year 7, but below 66.4 just before its salvage falls
 * from 70 to 35 in year 6, and only below 1.7 just after. "Well outside" is more than 5 % of the
 * larger end: more than the boundary's own error on a coarse lattice (about 3 % at 100 steps,
 * docs/engine.md §5), so the wobble of a coarse lattice is not read as a turn of the rule.
 */
function inBetween(points: { t: number; threshold: number }[], currency?: string): string {
  const ends = [points[0]!.threshold, points.at(-1)!.threshold];
  const margin = 0.05 * Math.max(1, ...ends.map(Math.abs));
  const lowest = points.reduce((a, b) => (b.threshold < a.threshold ? b : a));
  const highest = points.reduce((a, b) => (b.threshold > a.threshold ? b : a));
  const low = lowest.threshold < Math.min(...ends) - margin;
  const high = highest.threshold > Math.max(...ends) + margin;
  const at = (p: { t: number; threshold: number }) => `${formatMoney(p.threshold, currency)} (year ${years(p.t)})`;
  if (low && high) return `; in between, the threshold ranges from ${at(lowest)} to ${at(highest)}`;
  if (high) return `; in between, the threshold rises to ${at(highest)}`;
  if (low) return `; in between, the threshold falls to ${at(lowest)}`;
  return '';
}

/** The rule and then each decision it leads to: a line each on screen, */
export const ruleLines = (rule: DecisionRule) => [rule.text, ...rule.followUps.map((f) => f.text)];
/** and one paragraph in the workbook's cell and the board pack. */
export const ruleInFull = (rule: DecisionRule) => ruleLines(rule).join(' ');
