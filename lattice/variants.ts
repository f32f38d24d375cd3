/**
 * Models derived from a model for the re-runs behind the extras: the same project with only
 * some of its rights (stand-alone and incremental values), and with one input moved
 * (sensitivities). Each variant is a plain model that passes the same checks as the original.
 */
import type { CompiledModel, RightKind } from './compiled';
import { templateIds } from './compile-templates';
import { scaleCost } from './cost';
import type { OptionTemplate, ProjectModel } from './schema';
import type { Years } from './units';
import { firstOpenStep, snapToStep } from './window';

/**
 * The model with only the rights whose index passes `keep` (ids are kept), and whether it
 * stands on the static plan. One baseline (docs/engine.md §4): without a defer or stage right,
 * the project follows the static plan, built when that plan builds it (the defer window's first
 * date, or the last stage payment), so no right can be used before then. The variant is that
 * project's rights valued from today with their windows clipped to the build date and no
 * outlay; the caller adds their value to the static NPV (`onStaticPlan`).
 */
export function withRights(model: ProjectModel, compiled: CompiledModel, keep: (right: number) => boolean): { model: ProjectModel; onStaticPlan: boolean } {
  if (model.options && model.options.length > 0) {
    const ids = templateIds(model.options);
    const kept = model.options.flatMap((o, k) => (keep(k) ? [{ ...o, id: ids[k]! }] : []));
    const carriesOutlay = (o: OptionTemplate) => o.kind === 'defer' || o.kind === 'stage';
    const outlayRemoved = model.options.some(carriesOutlay) && !kept.some(carriesOutlay);
    if (!outlayRemoved) return { model: { ...model, options: kept }, onStaticPlan: false };
    const dt = model.horizon / model.steps;
    const firstUse = (firstOpenStep(compiled.staticPlan.enter, dt, model.steps) + 1) * dt;
    const options = firstUse > model.horizon ? [] : kept.flatMap((o) => clipped(o, firstUse, dt, model.horizon));
    return { model: { ...model, options, investment: 0 }, onStaticPlan: true };
  }
  return { model: { ...model, switches: (model.switches ?? []).filter((_, k) => keep(k)) }, onStaticPlan: false };
}

/** A right whose window opens no earlier than step time `from` (none when it closes before); dates snap to steps of `dt`. */
function clipped(option: OptionTemplate, from: Years, dt: Years, horizon: Years): OptionTemplate[] {
  const steps = Math.round(horizon / dt);
  const first = snapToStep(from, dt, steps);
  const onOrAfter = (t: Years) => snapToStep(t, dt, steps) >= first;
  if (option.kind === 'defer' || option.kind === 'stage') return [option];
  if (option.kind === 'mothball' && !option.window) return [{ ...option, window: { kind: 'american', from, to: horizon } }];
  const window = option.window!;
  switch (window.kind) {
    case 'american':
      // An American window's last step is the last at or before its end (lattice/window.ts).
      return snapToStep(window.to, dt, steps, 'earlier') < first ? [] : [{ ...option, window: { ...window, from: Math.max(window.from, from) } }];
    case 'bermudan': {
      const dates = window.dates.filter(onOrAfter);
      return dates.length === 0 ? [] : [{ ...option, window: { ...window, dates } }];
    }
    case 'european':
      return onOrAfter(window.at) ? [option] : [];
  }
}

export interface Bump {
  parameter: string;
  label: string;
  base: number;
  low: number;
  high: number;
  apply: (model: ProjectModel, input: number) => ProjectModel;
}

const RELATIVE = 0.1;
const RATE_STEP = 0.01;

/** Every payout of the project times a factor; a fraction stays below 1. */
function scalePayouts(u: ProjectModel['underlying'], factor: number): ProjectModel['underlying'] {
  const fraction = (f: number) => Math.min(f * factor, 0.999999);
  return {
    ...u,
    ...(u.payoutYield !== undefined ? { payoutYield: u.payoutYield * factor } : {}),
    ...(u.payoutPeriods ? { payoutPeriods: u.payoutPeriods.map((p) => ({ ...p, fraction: fraction(p.fraction) })) } : {}),
    ...(u.payouts ? { payouts: u.payouts.map((p) => ({ ...p, fraction: fraction(p.fraction) })) } : {}),
  };
}

function costBump(model: ProjectModel, k: number, factor: number): ProjectModel {
  const clone = structuredClone(model);
  if (clone.options && clone.options.length > 0) {
    const o = clone.options[k]!;
    switch (o.kind) {
      case 'expand':
      case 'defer':
        o.cost = scaleCost(o.cost, factor);
        break;
      case 'contract':
        o.savings = scaleCost(o.savings, factor);
        break;
      case 'abandon':
        o.salvage = scaleCost(o.salvage, factor);
        break;
      case 'stage':
        o.payments = o.payments.map((p) => ({ at: p.at, amount: p.amount * factor }));
        break;
      case 'mothball':
        o.cost = scaleCost(o.cost, factor);
        o.backCost = scaleCost(o.backCost, factor);
        break;
      default: {
        const unreachable: never = o;
        return unreachable;
      }
    }
  } else {
    const sw = clone.switches![k]!;
    sw.cost = scaleCost(sw.cost, factor);
  }
  return clone;
}

/** The field each kind of right keeps its money in, and how a tornado labels it. */
const costField: Record<RightKind, [field: string, label: string]> = {
  expand: ['cost', 'cost'],
  defer: ['cost', 'cost'],
  contract: ['savings', 'savings'],
  abandon: ['salvage', 'salvage'],
  stage: ['payments', 'payments'],
  mothball: ['cost', 'switching costs'],
  custom: ['cost', 'cost'],
};

/**
 * The inputs a tornado shows, each moved both ways from the case (central): V0 and σ ±10 %
 * relative, r ±1 percentage point (a relative move of a small rate means little), the payout
 * schedule scaled by 0.9 and 1.1, and each right's cost, proceeds or payments ±10 %.
 */
export function sensitivityBumps(model: ProjectModel, compiled: CompiledModel): Bump[] {
  const { value, volatility } = model.underlying;
  const bumps: Bump[] = [
    {
      parameter: 'underlying.value',
      label: 'Project value V0',
      base: value,
      low: value * (1 - RELATIVE),
      high: value * (1 + RELATIVE),
      apply: (m, x) => ({ ...m, underlying: { ...m.underlying, value: x } }),
    },
    {
      parameter: 'underlying.volatility',
      label: 'Volatility σ',
      base: volatility,
      low: volatility * (1 - RELATIVE),
      high: volatility * (1 + RELATIVE),
      apply: (m, x) => ({ ...m, underlying: { ...m.underlying, volatility: x } }),
    },
    {
      parameter: 'riskFreeRate',
      label: 'Risk-free rate r',
      base: model.riskFreeRate,
      low: model.riskFreeRate - RATE_STEP,
      high: model.riskFreeRate + RATE_STEP,
      apply: (m, x) => ({ ...m, riskFreeRate: x }),
    },
  ];
  // The payout schedule is scaled as a whole (its yield, yearly fractions and lumps), not
  // topped up with a yield of its own: the row reads "what if the project paid out 10 % more".
  const u = model.underlying;
  const hasPayouts = (u.payoutYield ?? 0) > 0 || (u.payoutPeriods ?? []).some((p) => p.fraction > 0) || (u.payouts ?? []).some((p) => p.fraction > 0);
  if (hasPayouts)
    bumps.push({
      parameter: 'underlying.payouts',
      label: 'Payout schedule',
      base: 1,
      low: 1 - RELATIVE,
      high: 1 + RELATIVE,
      apply: (m, factor) => ({ ...m, underlying: scalePayouts(m.underlying, factor) }),
    });
  compiled.rights.forEach((right, k) => {
    bumps.push({
      parameter: `${right.field}.${costField[right.kind]![0]}`,
      label: `${right.id} ${costField[right.kind]![1]}`,
      base: 1,
      low: 1 - RELATIVE,
      high: 1 + RELATIVE,
      apply: (m, factor) => costBump(m, k, factor),
    });
  });
  return bumps;
}
