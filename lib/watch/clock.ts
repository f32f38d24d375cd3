/**
 * The clock of a followed decision: an approved engine model seen from a later date. At t years
 * after the valuation date, with the project's value observed as V, the rights still open are
 * those of a fresh model whose horizon is T − t, whose windows, cost schedules and payouts are
 * shifted back by t, and whose underlying value is V (docs/engine.md, "Following a decision").
 *
 * Conventions, each the one the lattice already uses at a node of date t:
 * - V is observed after any payout dated t or earlier (a lump on a date belongs to the step that
 *   ends there); a payout period running across t keeps its constant yield for what is left, so
 *   the fraction still to be paid is 1 − (1 − f)^(left/length);
 * - a window date equal to t is still open (a decision can be made today);
 * - a growing cost keeps growing from where it stands: amount·e^(g·t) at the new time zero; a
 *   step schedule starts at the step in force at t;
 * - the investment paid at the valuation date is sunk; stage payments dated before t were made;
 * - the tree keeps its step length, so T − t is cut into round(N·(T − t)/T) steps.
 * Rights whose windows have all passed are removed and named in `closed`; a right to invest
 * (defer) whose window has passed cannot be followed and is refused.
 *
 * Decisions the team recorded (`used`) change the model from their date: a right declined is
 * removed; a right exercised is named in the model's `exercised` list so the tree starts in the
 * mode it made (a stage right exercised on t has its payment at t made). A switch in force can be
 * switched back only while its window is open. Every right keeps its approved id, so the
 * re-valued rights read against the approved ones.
 */
import { templateIds, type Cost, type ExerciseWindow, type OptionTemplate, type ProjectModel, type SwitchInput } from '@/lattice';

export class ClockError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'ClockError';
  }
}

/** Rights the team used or gave up on or before the date, by id. */
export interface UsedRights {
  exercised: string[];
  declined: string[];
}

export interface ModelAt {
  model: ProjectModel;
  /** Ids (or types, for unnamed rights) of the rights whose windows have all passed. */
  closed: string[];
}

/** A window seen from t, or null when it has passed. */
export function windowFrom(window: ExerciseWindow, t: number): ExerciseWindow | null {
  switch (window.kind) {
    case 'american':
      return window.to < t ? null : { kind: 'american', from: Math.max(0, window.from - t), to: window.to - t };
    case 'bermudan': {
      const dates = window.dates.filter((d) => d >= t).map((d) => d - t);
      return dates.length === 0 ? null : { kind: 'bermudan', dates };
    }
    case 'european':
      return window.at < t ? null : { kind: 'european', at: window.at - t };
  }
}

/** A cost seen from t: what it is at each later date, measured from the new time zero. */
export function costFrom(cost: Cost, t: number): Cost {
  if (typeof cost === 'number') return cost;
  if (!Array.isArray(cost)) return { amount: cost.amount * Math.exp(cost.growth * t), growth: cost.growth };
  const sorted = [...cost].sort((a, b) => a.from - b.from);
  const inForce = sorted.filter((s) => s.from <= t).at(-1);
  const later = sorted.filter((s) => s.from > t).map((s) => ({ from: s.from - t, amount: s.amount }));
  return inForce ? [{ from: 0, amount: inForce.amount }, ...later] : later;
}

function nameOf(o: OptionTemplate): string {
  return o.id ?? o.kind;
}

/**
 * A right already used, seen from t: its effect stays (the mode it made) and its own window no
 * longer matters, except a switch's, which is the window for switching back. A window that has
 * passed becomes a single date at the horizon, where switching back earns nothing.
 */
function usedTemplateFrom(o: OptionTemplate, t: number, horizon: number): OptionTemplate {
  const atEnd: ExerciseWindow = { kind: 'european', at: horizon };
  switch (o.kind) {
    case 'mothball': {
      // No window: switching back is possible at any time, as before.
      const { window, ...rest } = o;
      const back = window ? (windowFrom(window, t) ?? atEnd) : undefined;
      return { ...rest, cost: costFrom(o.cost, t), backCost: costFrom(o.backCost, t), ...(back ? { window: back } : {}) };
    }
    case 'stage':
      throw new ClockError('A stage right is followed payment by payment, not as one right used.');
    default:
      return { ...o, window: atEnd };
  }
}

function templateFrom(o: OptionTemplate, t: number): OptionTemplate | null {
  switch (o.kind) {
    case 'expand':
    case 'defer': {
      const window = windowFrom(o.window, t);
      if (!window) {
        if (o.kind === 'defer') throw new ClockError(`The right to invest (“${nameOf(o)}”) lapsed before this date: there is no project to follow.`);
        return null;
      }
      return { ...o, window, cost: costFrom(o.cost, t) };
    }
    case 'contract': {
      const window = windowFrom(o.window, t);
      return window ? { ...o, window, savings: costFrom(o.savings, t) } : null;
    }
    case 'abandon': {
      const window = windowFrom(o.window, t);
      return window ? { ...o, window, salvage: costFrom(o.salvage, t) } : null;
    }
    case 'stage': {
      const payments = o.payments.filter((p) => p.at >= t).map((p) => ({ at: p.at - t, amount: p.amount }));
      return payments.length === 0 ? null : { ...o, payments };
    }
    case 'mothball': {
      const window = o.window ? windowFrom(o.window, t) : undefined;
      if (window === null) return null;
      return { ...o, cost: costFrom(o.cost, t), backCost: costFrom(o.backCost, t), ...(window ? { window } : {}) };
    }
  }
}

function switchFrom(s: SwitchInput, t: number): SwitchInput | null {
  const window = windowFrom(s.window, t);
  return window ? { ...s, window, cost: costFrom(s.cost, t) } : null;
}

export function modelAt(model: ProjectModel, t: number, observedValue: number, used: UsedRights = { exercised: [], declined: [] }): ModelAt {
  if (!(t >= 0)) throw new ClockError('The date is before the valuation date.');
  if (!(t < model.horizon)) throw new ClockError('The date is at or beyond the model’s horizon: no right is left to follow.');
  if (!(observedValue > 0)) throw new ClockError('The observed value must be above 0.');
  const horizon = model.horizon - t;
  const closed: string[] = [];
  const ids = templateIds(model.options ?? []);
  const exercised: string[] = [];
  const options = (model.options ?? []).flatMap((o, k): OptionTemplate[] => {
    const id = ids[k]!;
    if (used.declined.includes(id)) return [];
    if (used.exercised.includes(id) && o.kind === 'stage') {
      // The payment due on t was made: only later ones are left.
      const payments = o.payments.filter((p) => p.at > t).map((p) => ({ at: p.at - t, amount: p.amount }));
      return payments.length === 0 ? [] : [{ ...o, id, payments }];
    }
    if (used.exercised.includes(id)) {
      exercised.push(id);
      return [{ ...usedTemplateFrom(o, t, horizon), id }];
    }
    const shifted = templateFrom(o, t);
    if (!shifted) closed.push(nameOf(o));
    return shifted ? [{ ...shifted, id }] : [];
  });
  const switches = (model.switches ?? []).flatMap((s) => {
    const shifted = switchFrom(s, t);
    if (!shifted) closed.push(s.id);
    return shifted ? [shifted] : [];
  });
  const { payouts, payoutPeriods } = model.underlying;
  const shifted: ProjectModel = {
    ...model,
    underlying: {
      ...model.underlying,
      value: observedValue,
      ...(payouts ? { payouts: payouts.filter((p) => p.at > t).map((p) => ({ at: p.at - t, fraction: p.fraction })) } : {}),
      ...(payoutPeriods
        ? {
            payoutPeriods: payoutPeriods
              .filter((p) => p.to > t)
              .map((p) =>
                p.from >= t
                  ? { from: p.from - t, to: p.to - t, fraction: p.fraction }
                  : { from: 0, to: p.to - t, fraction: 1 - Math.pow(1 - p.fraction, (p.to - t) / (p.to - p.from)) },
              ),
          }
        : {}),
    },
    horizon,
    steps: Math.max(1, Math.round((model.steps * horizon) / model.horizon)),
    ...(model.investment !== undefined ? { investment: t > 0 ? 0 : model.investment } : {}),
    ...(model.options ? { options } : {}),
    ...(exercised.length > 0 ? { exercised } : {}),
    ...(model.switches ? { switches } : {}),
  };
  return { model: shifted, closed };
}
