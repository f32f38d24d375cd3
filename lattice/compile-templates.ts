/**
 * Compiles the option templates (expand, contract, abandon, defer, stage, switch) into modes and
 * switches. A mode is a reachable combination of exercised rights; conventions:
 * - scale effects add: the operating scale is 1 + Σ expand factors − Σ contract fractions of
 *   the rights exercised so far (floored at 0);
 * - a `switch` template (mothball/restart, or any reversible change) multiplies the scale of
 *   the mode it is in by `toScale` while switched and earns its `flowPerYear` (e.g. a negative
 *   maintenance cost); while switched only switching back and abandoning are possible;
 * - one-shot rights (expand, contract, abandon, defer, each stage payment) can be exercised
 *   once; abandon closes the project from any operating mode, switched or not;
 * - money attaches to the scale it sells (docs/engine.md §4): abandonment receives the salvage
 *   times the operating scale left (after contracting by c, (1 − c) of it; after expanding by
 *   e, (1 + e) of it; a mothballed plant sells at its operating scale), unless the card asks
 *   for a fixed amount; contraction savings are already per fraction sold. So selling
 *   piecemeal never beats selling whole by construction;
 * - defer starts the project in a `waiting` mode (scale 0) that is left by paying the defer
 *   cost inside the window; when the window has passed the right lapses and waiting is worth 0;
 * - stage makes continuation require each payment on its date (a compound option, Geske 1979):
 *   the project earns nothing until the last payment is made, and skipping a payment ends it.
 */
import type { CompiledMode, CompiledModel, CompiledSwitch, Right, RightKind } from './compiled';
import { costAt, negateCost, scaleCost } from './cost';
import { refuse } from './errors';
import { MAX_MODES } from './limits';
import type { Cost, ExerciseWindow, OptionTemplate, ProjectModel } from './schema';
import { TODAY, windowStart } from './window';

type Phase = 'waiting' | 'staging' | 'operating' | 'closed';

interface State {
  phase: Phase;
  /** Stage payments made so far (staging only). */
  paid: number;
  /** Bit k set when one-shot template k (expand or contract) has been exercised. */
  exercised: number;
  /** Index of the switch template in force, or −1. */
  switched: number;
}

interface Move {
  template: number;
  to: State;
  cost: Cost;
  window: ExerciseWindow;
  field: string;
}

const keyOf = (s: State) => `${s.phase}|${s.paid}|${s.exercised}|${s.switched}`;

/**
 * Each template's id as the result names it: its own, or `kind-n` (the n-th right of that kind).
 * Every list of rights beside the result's figures names them so (comparison, workbook, report).
 */
export function rightIds(options: OptionTemplate[]): string[] {
  const counts = new Map<string, number>();
  return options.map((option) => {
    const n = (counts.get(option.kind) ?? 0) + 1;
    counts.set(option.kind, n);
    return option.id ?? `${option.kind}-${n}`;
  });
}

/** The ids of `rightIds`, refusing duplicates. */
export function templateIds(options: OptionTemplate[]): string[] {
  const ids = rightIds(options);
  ids.forEach((id, k) => {
    if (ids.indexOf(id) !== k) refuse(`options[${k}].id`, `must be unique, "${id}" is used twice`);
  });
  return ids;
}

export function compileTemplates(model: ProjectModel): CompiledModel {
  const options = model.options ?? [];
  const ids = templateIds(options);
  const deferAt = options.findIndex((o) => o.kind === 'defer');
  const stageAt = options.findIndex((o) => o.kind === 'stage');
  if (options.filter((o) => o.kind === 'defer').length > 1) refuse('options', 'may hold at most one defer right');
  if (options.filter((o) => o.kind === 'stage').length > 1) refuse('options', 'may hold at most one stage right');
  if (deferAt >= 0 && stageAt >= 0) refuse(`options[${stageAt}]`, 'cannot be combined with a defer right: make the first stage payment the defer cost');
  if ((deferAt >= 0 || stageAt >= 0) && model.investment !== undefined && model.investment !== 0)
    refuse('investment', 'must be omitted when a defer or stage right carries the outlay');

  const whole: ExerciseWindow = { kind: 'american', from: 0, to: model.horizon };
  const stage = stageAt >= 0 ? (options[stageAt] as Extract<OptionTemplate, { kind: 'stage' }>) : undefined;

  /** The scale of the plant held, before any switch (mothballing) multiplies it. */
  function operatingScale(s: State): number {
    let scale = 1;
    options.forEach((o, k) => {
      if (!(s.exercised & (1 << k))) return;
      if (o.kind === 'expand') scale += o.factor;
      if (o.kind === 'contract') scale -= o.fraction;
    });
    return Math.max(0, scale);
  }

  function modeOf(s: State): CompiledMode {
    if (s.phase === 'waiting') return { id: 'waiting', scale: 0, flowPerYear: 0, terminal: 0 };
    if (s.phase === 'closed') return { id: 'closed', scale: 0, flowPerYear: 0, terminal: 0 };
    if (s.phase === 'staging') return { id: `${ids[stageAt]} payment ${s.paid + 1} due`, scale: 0, flowPerYear: 0, terminal: 0 };
    let scale = operatingScale(s);
    let id = 'operating';
    options.forEach((o, k) => {
      if (s.exercised & (1 << k)) id += `+${ids[k]}`;
    });
    let flowPerYear = 0;
    if (s.switched >= 0) {
      const sw = options[s.switched] as Extract<OptionTemplate, { kind: 'mothball' }>;
      scale *= sw.toScale;
      flowPerYear = sw.flowPerYear ?? 0;
      id += ` (${ids[s.switched]})`;
    }
    return { id, scale, flowPerYear, terminal: 0 };
  }

  function movesFrom(s: State): Move[] {
    const moves: Move[] = [];
    const field = (k: number) => `options[${k}]`;
    if (s.phase === 'waiting') {
      const o = options[deferAt] as Extract<OptionTemplate, { kind: 'defer' }>;
      moves.push({ template: deferAt, to: { ...s, phase: 'operating' }, cost: o.cost, window: o.window, field: field(deferAt) });
    }
    if (s.phase === 'staging' && stage) {
      const payment = stage.payments[s.paid]!;
      const last = s.paid + 1 === stage.payments.length;
      moves.push({
        template: stageAt,
        to: last ? { ...s, phase: 'operating', paid: 0 } : { ...s, paid: s.paid + 1 },
        cost: payment.amount,
        window: { kind: 'european', at: payment.at },
        field: `${field(stageAt)}.payments[${s.paid}]`,
      });
    }
    if (s.phase !== 'operating') return moves;
    const running = s.switched < 0;
    options.forEach((o, k) => {
      const done = (s.exercised & (1 << k)) !== 0;
      // Every type says what it can do from an operating mode: the compiler refuses a type left out.
      switch (o.kind) {
        case 'abandon': {
          const salvage = o.fixedSalvage ? o.salvage : scaleCost(o.salvage, operatingScale(s));
          moves.push({ template: k, to: { ...s, phase: 'closed', exercised: 0, switched: -1 }, cost: negateCost(salvage), window: o.window, field: field(k) });
          break;
        }
        case 'mothball':
          if (k === s.switched)
            moves.push({ template: k, to: { ...s, switched: -1 }, cost: o.backCost, window: o.window ?? whole, field: `${field(k)}.backCost` });
          else if (running) moves.push({ template: k, to: { ...s, switched: k }, cost: o.cost, window: o.window ?? whole, field: field(k) });
          break;
        case 'expand':
          if (running && !done) moves.push({ template: k, to: { ...s, exercised: s.exercised | (1 << k) }, cost: o.cost, window: o.window, field: field(k) });
          break;
        case 'contract':
          if (running && !done)
            moves.push({ template: k, to: { ...s, exercised: s.exercised | (1 << k) }, cost: negateCost(o.savings), window: o.window, field: field(k) });
          break;
        case 'defer':
        case 'stage':
          // Used before the project operates (the waiting and staging phases above).
          break;
        default: {
          const unreachable: never = o;
          return unreachable;
        }
      }
    });
    return moves;
  }

  const operatingBase: State = { phase: 'operating', paid: 0, exercised: 0, switched: -1 };
  const startState: State = usedBefore(deferAt >= 0 ? { ...operatingBase, phase: 'waiting' } : stage ? { ...operatingBase, phase: 'staging' } : operatingBase);

  /**
   * The state the rights used before the valuation date (`model.exercised`) left: an investment
   * made, scale changes made, a switch in force, or the project closed. Stage payments are not
   * named here: a followed model drops the payments made (lib/watch/clock.ts).
   */
  function usedBefore(first: State): State {
    let s = first;
    for (const [n, name] of (model.exercised ?? []).entries()) {
      const k = ids.indexOf(name);
      const field = `exercised[${n}]`;
      if (k < 0) refuse(field, `names no option template ("${name}")`);
      const o = options[k]!;
      if (o.kind === 'stage') refuse(field, 'cannot name a stage right: give only the payments still to make');
      if (s.phase === 'closed') refuse(field, 'follows an abandonment: nothing is left to use');
      if (o.kind === 'defer') s = { ...s, phase: 'operating' };
      else if (s.phase !== 'operating') refuse(field, `needs the project operating: name the defer right "${ids[deferAt]}" as used first`);
      else if (o.kind === 'abandon') s = { ...s, phase: 'closed', exercised: 0, switched: -1 };
      else if (o.kind === 'mothball') s = { ...s, switched: k };
      else s = { ...s, exercised: s.exercised | (1 << k) };
    }
    return s;
  }

  const modes: CompiledMode[] = [];
  const indexOf = new Map<string, number>();
  const queue: State[] = [];
  const visit = (s: State): number => {
    const key = keyOf(s);
    let k = indexOf.get(key);
    if (k === undefined) {
      k = modes.length;
      if (k >= MAX_MODES) refuse('options', `compile to more than ${MAX_MODES} operating modes; use fewer rights`);
      indexOf.set(key, k);
      modes.push(modeOf(s));
      queue.push(s);
    }
    return k;
  };
  const start = visit(startState);
  const staticMode = visit(operatingBase);

  const switches: CompiledSwitch[] = [];
  for (let q = 0; q < queue.length; q++) {
    const s = queue[q]!;
    const from = indexOf.get(keyOf(s))!;
    for (const move of movesFrom(s)) {
      switches.push({ right: move.template, from, to: visit(move.to), cost: move.cost, window: move.window, field: move.field });
    }
  }

  const rights: Right[] = options.map((o, k) => ({
    id: ids[k]!,
    kind: o.kind as RightKind,
    field: `options[${k}]`,
    primaryFrom: k === deferAt || k === stageAt ? start : staticMode,
  }));

  const discount = (t: number) => Math.exp(-model.riskFreeRate * t);
  let staticPlan: CompiledModel['staticPlan'];
  if (deferAt >= 0) {
    const defer = options[deferAt] as Extract<OptionTemplate, { kind: 'defer' }>;
    staticPlan = { mode: staticMode, enter: defer.window, outlays: [{ on: defer.window, cost: defer.cost }] };
  } else if (stage) {
    const on = (at: number): ExerciseWindow => ({ kind: 'european', at });
    staticPlan = { mode: staticMode, enter: on(stage.payments.at(-1)!.at), outlays: stage.payments.map((p) => ({ on: on(p.at), cost: p.amount })) };
  } else {
    staticPlan = { mode: staticMode, enter: TODAY, outlays: [{ on: TODAY, cost: model.investment ?? 0 }] };
  }
  const staticInvestment = staticPlan.outlays.reduce((sum, o) => sum + costAt(o.cost, windowStart(o.on)) * discount(windowStart(o.on)), 0);
  const upfront = deferAt >= 0 || stage ? 0 : (model.investment ?? 0);
  return { modes, switches, rights, start, staticPlan, staticInvestment, upfront };
}
