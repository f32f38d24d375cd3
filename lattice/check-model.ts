/**
 * Parses and checks a model before any work (docs/engine.md §8), and compiles it. Shape rules come
 * from the zod schema; the rules here relate fields to each other. Every refusal is a
 * `ModelError` naming the field and the rule; nothing is ever valued from a model that failed.
 */
import type { CompiledModel } from './compiled';
import { compileRaw } from './compile-raw';
import { compileTemplates } from './compile-templates';
import { costAt } from './cost';
import { ModelError, refuse } from './errors';
import { formatIssues } from './format-issues';
import { MAX_DECISION_CELLS } from './limits';
import { projectModelSchema, type Cost, type ExerciseWindow, type ProjectModel } from './schema';
import { windowEnd } from './window';

/** Parses unknown input into a model, or throws a ModelError listing every shape problem. */
export function parseModel(input: unknown): ProjectModel {
  const parsed = projectModelSchema.safeParse(input, { reportInput: true });
  if (!parsed.success) throw new ModelError(formatIssues(parsed.error));
  return parsed.data;
}

function checkWindow(window: ExerciseWindow, horizon: number, field: string) {
  if (window.kind === 'american' && window.from > window.to) refuse(`${field}.from`, `must be ≤ ${field}.to, got ${window.from} > ${window.to}`);
  const end = windowEnd(window);
  if (end > horizon + 1e-12) refuse(`${field}`, `must lie inside the horizon (0 to ${horizon} years), ends at ${end}`);
}

function checkCost(cost: Cost, field: string) {
  if (!Array.isArray(cost)) return;
  for (let k = 1; k < cost.length; k++) {
    if (!(cost[k]!.from > cost[k - 1]!.from))
      refuse(
        `${field}[${k}].from`,
        `must be later than ${field}[${k - 1}].from (schedules run in time order), got ${cost[k]!.from} after ${cost[k - 1]!.from}`,
      );
  }
}

function checkFieldsInTime(model: ProjectModel) {
  const h = model.horizon;
  (model.underlying.payouts ?? []).forEach((p, k) => {
    if (p.at > h) refuse(`underlying.payouts[${k}].at`, `must be ≤ horizon (${h}), got ${p.at}`);
  });
  (model.underlying.payoutPeriods ?? []).forEach((p, k) => {
    if (!(p.to > p.from)) refuse(`underlying.payoutPeriods[${k}].to`, `must be later than its from (${p.from}), got ${p.to}`);
    if (p.to > h) refuse(`underlying.payoutPeriods[${k}].to`, `must be ≤ horizon (${h}), got ${p.to}`);
  });
  (model.switches ?? []).forEach((sw, k) => {
    checkWindow(sw.window, h, `switches[${k}].window`);
    checkCost(sw.cost, `switches[${k}].cost`);
  });
  (model.options ?? []).forEach((o, k) => {
    const f = `options[${k}]`;
    switch (o.kind) {
      case 'expand':
      case 'defer':
        checkWindow(o.window, h, `${f}.window`);
        checkCost(o.cost, `${f}.cost`);
        return;
      case 'contract':
        checkWindow(o.window, h, `${f}.window`);
        checkCost(o.savings, `${f}.savings`);
        return;
      case 'abandon':
        checkWindow(o.window, h, `${f}.window`);
        checkCost(o.salvage, `${f}.salvage`);
        return;
      case 'mothball':
        if (o.window) checkWindow(o.window, h, `${f}.window`);
        checkCost(o.cost, `${f}.cost`);
        checkCost(o.backCost, `${f}.backCost`);
        return;
      case 'stage':
        o.payments.forEach((p, j) => {
          if (p.at > h) refuse(`${f}.payments[${j}].at`, `must be ≤ horizon (${h}), got ${p.at}`);
          if (j > 0 && !(p.at > o.payments[j - 1]!.at))
            refuse(`${f}.payments[${j}].at`, `must be later than the payment before it, got ${p.at} after ${o.payments[j - 1]!.at}`);
        });
        return;
      default: {
        const unreachable: never = o;
        return unreachable;
      }
    }
  });
}

/** The cheapest a switch can ever be inside its window (sampled at every step). */
function cheapestCost(cost: Cost, horizon: number, steps: number): number {
  if (typeof cost === 'number') return cost;
  let min = Infinity;
  const dt = horizon / steps;
  for (let i = 0; i <= steps; i++) min = Math.min(min, costAt(cost, i * dt));
  return min;
}

/**
 * Refuses a cycle of switches whose cheapest costs sum to less than zero: going round it would
 * pay money every lap (a money pump) and the value would have no bound. Bellman–Ford on the
 * mode graph finds such a cycle.
 */
function checkNoMoneyPump(compiled: CompiledModel, model: ProjectModel) {
  const n = compiled.modes.length;
  const edges = compiled.switches.map((s) => ({
    s,
    w: cheapestCost(s.cost, model.horizon, Math.min(model.steps, 2000)),
  }));
  const dist = new Float64Array(n);
  let changed = false;
  for (let round = 0; round < n; round++) {
    changed = false;
    for (const { s, w } of edges) {
      if (dist[s.from]! + w < dist[s.to]! - 1e-9) {
        dist[s.to] = dist[s.from]! + w;
        changed = true;
      }
    }
    if (!changed) return;
  }
  const culprit = edges.find(({ s, w }) => dist[s.from]! + w < dist[s.to]! - 1e-9)!;
  refuse(
    culprit.s.field,
    `is part of a cycle of switches whose costs sum to less than zero (switching round it would pay for itself); ` +
      `make the costs of going and coming back add up to at least 0`,
  );
}

/** Parses, checks and compiles; the one gate every valuation passes through. */
export function prepareModel(input: unknown): { model: ProjectModel; compiled: CompiledModel } {
  const model = parseModel(input);
  const usesTemplates = model.options !== undefined && model.options.length > 0;
  if (usesTemplates && (model.modes !== undefined || model.switches !== undefined))
    refuse('options', 'cannot be combined with modes and switches: give either option templates or your own modes and switches');
  if (!model.modes && (model.start !== undefined || model.switches !== undefined))
    refuse(model.start !== undefined ? 'start' : 'switches', 'needs modes to be given');
  if (model.exercised?.length && !usesTemplates) refuse('exercised', 'names option templates: give options to mark some as used');
  checkFieldsInTime(model);
  const compiled = usesTemplates ? compileTemplates(model) : compileRaw(model);
  checkNoMoneyPump(compiled, model);
  const switchable = new Set(compiled.switches.map((s) => s.from)).size;
  const cells = ((model.steps + 1) * (model.steps + 2) * switchable) / 2;
  if (cells > MAX_DECISION_CELLS)
    refuse(
      'steps',
      `× switchable modes gives ${cells.toExponential(2)} node × mode cells to visit, over the limit of ${MAX_DECISION_CELLS.toExponential(2)}; use fewer steps or fewer rights`,
    );
  return { model, compiled };
}
