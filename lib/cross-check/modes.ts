/**
 * The cross-check's own reading of a model: the ways the project can be run (states) and the
 * moves between them, written from the model's contract (docs/engine.md §2 and §4), not from
 * the lattice's compiler. Only the model's schema is shared with lattice/, so a mistake in one
 * reading shows up as a disagreement instead of being copied into both.
 *
 * A state is what the rights used so far have made of the project: not yet built (waiting on a
 * defer right), part-funded (stage payments made), running at some scale (expansions and
 * contractions add up; a reversible change such as mothballing multiplies the scale while in
 * force and earns its own flow), or closed. Every move is one right used once, on the dates its
 * window allows.
 */
import type { Cost, ExerciseWindow, OptionTemplate, ProjectModel } from '@/lattice/schema';

export interface State {
  name: string;
  scale: number;
  flowPerYear: number;
  terminal: number;
}

export interface Move {
  /** Index into `rights`. */
  right: number;
  from: number;
  to: number;
  /** Paid by the holder when positive, received when negative. */
  cost: Cost;
  window: ExerciseWindow;
}

export interface StateGraph {
  states: State[];
  moves: Move[];
  start: number;
  /** Right ids as the valuation names them (a template's own id, or `type-n`). */
  rights: string[];
  /** Paid today outside any right: expanded NPV = value − upfront. */
  upfront: number;
}

/** Proceeds are negative costs; money tied to scale is scaled. */
function times(cost: Cost, factor: number): Cost {
  if (typeof cost === 'number') return cost * factor;
  if (Array.isArray(cost)) return cost.map((step) => ({ from: step.from, amount: step.amount * factor }));
  return { amount: cost.amount * factor, growth: cost.growth };
}

function rightIds(options: OptionTemplate[]): string[] {
  const seen = new Map<string, number>();
  return options.map((option) => {
    const n = (seen.get(option.kind) ?? 0) + 1;
    seen.set(option.kind, n);
    return option.id ?? `${option.kind}-${n}`;
  });
}

/** The advanced form: states and moves are given. */
function fromRaw(model: ProjectModel): StateGraph {
  const given = model.modes ?? [{ id: 'operating', scale: 1 }];
  const at = new Map(given.map((m, k) => [m.id, k]));
  const moves: Move[] = [];
  const rights: string[] = [];
  for (const sw of model.switches ?? []) {
    rights.push(sw.id);
    for (const from of sw.from) moves.push({ right: rights.length - 1, from: at.get(from)!, to: at.get(sw.to)!, cost: sw.cost, window: sw.window });
  }
  return {
    states: given.map((m) => ({ name: m.id, scale: m.scale, flowPerYear: m.flowPerYear ?? 0, terminal: m.terminal ?? 0 })),
    moves,
    start: model.start === undefined ? 0 : at.get(model.start)!,
    rights,
    upfront: model.investment ?? 0,
  };
}

/** Where the project stands, as a key: phase, then what it depends on. */
type Standing =
  | { phase: 'unbuilt' }
  | { phase: 'funding'; paymentsMade: number }
  | { phase: 'running'; used: readonly number[]; paused: number | null }
  | { phase: 'closed' };

function fromTemplates(model: ProjectModel): StateGraph {
  const options = model.options ?? [];
  const ids = rightIds(options);
  const always: ExerciseWindow = { kind: 'american', from: 0, to: model.horizon };
  const deferIndex = options.findIndex((o) => o.kind === 'defer');
  const stageIndex = options.findIndex((o) => o.kind === 'stage');

  const plantScale = (used: readonly number[]) =>
    Math.max(
      0,
      used.reduce((scale, k) => {
        const o = options[k]!;
        return o.kind === 'expand' ? scale + o.factor : o.kind === 'contract' ? scale - o.fraction : scale;
      }, 1),
    );

  const states: State[] = [];
  const keys = new Map<string, number>();
  const pending: Standing[] = [];
  const stateOf = (s: Standing): number => {
    const key = JSON.stringify(s);
    const known = keys.get(key);
    if (known !== undefined) return known;
    let state: State;
    if (s.phase === 'running') {
      const paused = s.paused === null ? null : (options[s.paused] as Extract<OptionTemplate, { kind: 'mothball' }>);
      const base = plantScale(s.used);
      state = {
        name: ['running', ...s.used.map((k) => ids[k]), ...(s.paused === null ? [] : [`paused by ${ids[s.paused]}`])].join(' · '),
        scale: paused ? base * paused.toScale : base,
        flowPerYear: paused?.flowPerYear ?? 0,
        terminal: 0,
      };
    } else state = { name: s.phase === 'funding' ? `funding, ${s.paymentsMade} paid` : s.phase, scale: 0, flowPerYear: 0, terminal: 0 };
    keys.set(key, states.length);
    states.push(state);
    pending.push(s);
    return states.length - 1;
  };

  const first: Standing =
    deferIndex >= 0 ? { phase: 'unbuilt' } : stageIndex >= 0 ? { phase: 'funding', paymentsMade: 0 } : { phase: 'running', used: [], paused: null };
  const start = stateOf(first);
  const moves: Move[] = [];
  for (let n = 0; n < pending.length; n++) {
    const s = pending[n]!;
    const from = n;
    const add = (right: number, to: Standing, cost: Cost, window: ExerciseWindow) => moves.push({ right, from, to: stateOf(to), cost, window });
    if (s.phase === 'unbuilt') {
      const defer = options[deferIndex] as Extract<OptionTemplate, { kind: 'defer' }>;
      add(deferIndex, { phase: 'running', used: [], paused: null }, defer.cost, defer.window);
    } else if (s.phase === 'funding') {
      const stage = options[stageIndex] as Extract<OptionTemplate, { kind: 'stage' }>;
      const payment = stage.payments[s.paymentsMade]!;
      const done = s.paymentsMade + 1 === stage.payments.length;
      add(stageIndex, done ? { phase: 'running', used: [], paused: null } : { phase: 'funding', paymentsMade: s.paymentsMade + 1 }, payment.amount, {
        kind: 'european',
        at: payment.at,
      });
    } else if (s.phase === 'running') {
      options.forEach((o, k) => {
        const used = s.used.includes(k);
        const withIt = [...s.used, k].sort((a, b) => a - b);
        // Every option type says what it can do from a running plant: the compiler refuses a type left out.
        switch (o.kind) {
          case 'abandon':
            // A sale is open whether or not the plant is paused; it sells the plant's scale as built.
            add(k, { phase: 'closed' }, times(o.salvage, o.fixedSalvage ? -1 : -plantScale(s.used)), o.window);
            break;
          case 'mothball':
            if (s.paused === k) add(k, { ...s, paused: null }, o.backCost, o.window ?? always);
            else if (s.paused === null) add(k, { ...s, paused: k }, o.cost, o.window ?? always);
            break;
          case 'expand':
            if (s.paused === null && !used) add(k, { ...s, used: withIt }, o.cost, o.window);
            break;
          case 'contract':
            if (s.paused === null && !used) add(k, { ...s, used: withIt }, times(o.savings, -1), o.window);
            break;
          case 'defer':
          case 'stage':
            // Used before the plant runs (the unbuilt and funding states above).
            break;
          default: {
            const unknown: never = o;
            throw new Error(`no reading of option ${JSON.stringify(unknown)}`);
          }
        }
      });
    }
  }
  const carried = deferIndex >= 0 || stageIndex >= 0;
  return { states, moves, start, rights: ids, upfront: carried ? 0 : (model.investment ?? 0) };
}

export function readStates(model: ProjectModel): StateGraph {
  if (model.exercised?.length) throw new Error('A model followed after rights were used is not cross-checked; cross-check the case as approved.');
  return model.options === undefined ? fromRaw(model) : fromTemplates(model);
}
