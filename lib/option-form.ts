/**
 * The option cards' form model and its two-way mapping to the engine's option templates.
 * Forms hold text (what people type); templates hold numbers. `toTemplates` turns every card
 * into a template and collects a message per field that does not read, keyed by the form path
 * (`options.1.cost.amount`), so each message appears beside its input. Percentages on the cards
 * (growth, expansion factor, fraction kept) are fractions in the templates.
 */
import type { CashFlowAnalysis } from './cash-flows';
import { readNumberText } from './number-text';
import { optionTemplateSchema, type Cost, type ExerciseWindow, type OptionTemplate } from '@/lattice';

export type OptionKind = OptionTemplate['kind'];
export type CostKind = 'constant' | 'growing' | 'scheduled';

export interface CostForm {
  kind: CostKind;
  amount: string;
  /** Growth a year, in %. */
  growth: string;
  schedule: { from: string; amount: string }[];
}

export interface WindowForm {
  kind: ExerciseWindow['kind'];
  from: string;
  to: string;
  /** Bermudan dates in years, separated by commas or spaces. */
  dates: string;
  at: string;
}

export interface OptionForm {
  kind: OptionKind;
  label: string;
  /** Expand: added scale in %; contract: share given up in %; mothball: scale kept while paused in %. */
  share: string;
  cost: CostForm;
  backCost: CostForm;
  flowPerYear: string;
  window: WindowForm;
  payments: { at: string; amount: string }[];
  /** Abandon: the salvage is one amount whatever scale is left (otherwise it follows the scale sold). */
  fixedSalvage: boolean;
}

export const optionKindLabels: Record<OptionKind, string> = {
  expand: 'Expand',
  contract: 'Contract',
  abandon: 'Abandon',
  defer: 'Defer',
  stage: 'Stage',
  mothball: 'Mothball & restart',
};

/** A right's kind as a result names it, in the cards' words (a kind no card has, as the engine wrote it). */
export function rightKindLabel(kind: string): string {
  return optionKindLabels[kind as OptionKind] ?? kind;
}

/** The kind to print beside a right's name, or null when the name is the kind's own ("Expand (Expand)" said it twice). */
export function kindBesideName(id: string, kind: string): string | null {
  const label = rightKindLabel(kind);
  return id.trim().toLowerCase() === label.toLowerCase() ? null : label;
}

/** A right's name with its kind in brackets, when the kind says more (the board pack's table). */
export function nameWithKind(id: string, kind: string): string {
  const beside = kindBesideName(id, kind);
  return beside ? `${id} (${beside})` : id;
}

const num = (value: number) => String(Number(value.toPrecision(12)));
const pct = (fraction: number) => num(fraction * 100);

function costToForm(cost: Cost | undefined): CostForm {
  if (cost === undefined || typeof cost === 'number')
    return { kind: 'constant', amount: num(cost ?? 0), growth: '0', schedule: [{ from: '0', amount: num(cost ?? 0) }] };
  if (Array.isArray(cost))
    return { kind: 'scheduled', amount: num(cost[0]?.amount ?? 0), growth: '0', schedule: cost.map((s) => ({ from: num(s.from), amount: num(s.amount) })) };
  return { kind: 'growing', amount: num(cost.amount), growth: pct(cost.growth), schedule: [{ from: '0', amount: num(cost.amount) }] };
}

function windowToForm(window: ExerciseWindow | undefined, horizon: number): WindowForm {
  const base = { kind: 'american' as const, from: '0', to: num(horizon), dates: '', at: num(horizon) };
  if (!window) return base;
  if (window.kind === 'american') return { ...base, from: num(window.from), to: num(window.to) };
  if (window.kind === 'bermudan') return { ...base, kind: 'bermudan', dates: window.dates.map(num).join(', ') };
  return { ...base, kind: 'european', at: num(window.at) };
}

export function templateToForm(t: OptionTemplate, horizon: number): OptionForm {
  const form: OptionForm = {
    kind: t.kind,
    label: t.id ?? '',
    share: '',
    cost: costToForm(0),
    backCost: costToForm(0),
    flowPerYear: '0',
    window: windowToForm(undefined, horizon),
    payments: [],
    fixedSalvage: false,
  };
  switch (t.kind) {
    case 'expand':
      return { ...form, share: pct(t.factor), cost: costToForm(t.cost), window: windowToForm(t.window, horizon) };
    case 'contract':
      return { ...form, share: pct(t.fraction), cost: costToForm(t.savings), window: windowToForm(t.window, horizon) };
    case 'abandon':
      return { ...form, cost: costToForm(t.salvage), fixedSalvage: t.fixedSalvage ?? false, window: windowToForm(t.window, horizon) };
    case 'defer':
      return { ...form, cost: costToForm(t.cost), window: windowToForm(t.window, horizon) };
    case 'stage':
      return { ...form, payments: t.payments.map((p) => ({ at: num(p.at), amount: num(p.amount) })) };
    case 'mothball':
      return {
        ...form,
        share: pct(t.toScale),
        cost: costToForm(t.cost),
        backCost: costToForm(t.backCost),
        flowPerYear: num(t.flowPerYear ?? 0),
        window: windowToForm(t.window, horizon),
      };
  }
}

/** What a fresh card is sized against: the project's value and the static plan's outlays. */
export interface CardBasis {
  horizon: number;
  /** V0, the value of the operating cash flows. */
  v0: number;
  /** The static plan's capex in present value (at the WACC), as the NPV without flexibility uses it. */
  investment: number;
  /**
   * The capex as stage payments: each year's amount restated so that its value today at the
   * risk-free rate (how the engine discounts a stage payment) equals its value at the WACC.
   */
  stagePayments: { at: number; amount: number }[];
  /**
   * The last date a fresh card that sells or shrinks the project stays open: a year before the
   * horizon. At the horizon the project has paid out everything and is worth nothing, so any
   * salvage or savings then would be a certain gain, a plan rather than an option.
   */
  lastSale: number;
  /** What the project is expected to be worth at `lastSale`, after that year's cash (at the WACC, in that year's money). */
  valueAtLastSale: number;
  /** The first year after today with a positive operating cash flow (at most `lastSale`): pausing before it stops nothing. */
  firstEarning: number;
}

/** The basis for fresh cards from a case's cash-flow analysis and risk-free rate. */
export function cardBasis(analysis: CashFlowAnalysis | null, horizon: number, riskFreeRate: number): CardBasis {
  const v0 = analysis && analysis.underlyingValue > 0 ? analysis.underlyingValue : 100;
  const outlays = (analysis?.outlays ?? []).filter((o) => o.amount > 0 && o.year <= horizon);
  // A one-year schedule has no whole year before its horizon: half-way through it, half the value.
  const lastSale = horizon >= 2 ? horizon - 1 : horizon / 2;
  const at = analysis?.rows.find((r) => r.year === lastSale);
  const after = (analysis?.rows ?? []).filter((r) => r.year > lastSale).reduce((sum, r) => sum + r.operatingCashFlow * r.discountFactor, 0);
  const valueAtLastSale = at && after > 0 ? after / at.discountFactor : v0 / 2;
  return {
    horizon,
    v0,
    investment: analysis?.investment ?? 0,
    stagePayments: outlays.map((o) => ({ at: o.year, amount: Math.round(o.amount * o.discountFactor * Math.exp(riskFreeRate * o.year) * 100) / 100 })),
    lastSale,
    valueAtLastSale,
    firstEarning: Math.min(lastSale, analysis?.rows.find((r) => r.year > 0 && r.operatingCashFlow > 0)?.year ?? 1),
  };
}

/**
 * A fresh sale pays, and a fresh contraction saves for the share it gives up, this share of what
 * the project is expected to be worth at the card's last date: both are used when the project
 * is worth less than planned, neither for certain. Sized on V0 instead, both were used with
 * probability 100 % on every demo schedule (selling for half of V0 near the end of a schedule
 * whose value runs down to nothing); at 70 % of the late value, 63–80 % (measured 2026-12-05;
 * tests/unit/option-form holds each between never and the plan-like 95 %).
 */
const LATE_VALUE_SHARE = 0.7;

/**
 * A fresh pause saves this share of the same late value a year, from the first year the project
 * earns: saving nothing, it was never used; open before the project earns, it was a certain
 * gain (the pilot line's years without revenue). At 30 %, used in 29–50 % of outcomes on the
 * demo schedules, alone or beside a fresh sale (measured 2026-12-05).
 */
const PAUSE_SAVING_SHARE = 0.3;

/**
 * A fresh card of a kind, sized against the project. A right that carries the outlay (defer,
 * stage) starts from the static plan's own outlay, so adding it never moves the NPV without
 * flexibility (docs/engine.md §5); a sale, a contraction and a pause from the value expected at
 * their last date (above); the others from shares of V0.
 */
export function newOptionForm(kind: OptionKind, basis: CardBasis): OptionForm {
  const { horizon, v0, lastSale, valueAtLastSale, firstEarning } = basis;
  const round = (x: number) => Math.max(1, Math.round(x));
  const outlay = Math.round(Math.max(0, basis.investment) * 100) / 100;
  const payments = basis.stagePayments.length > 0 ? basis.stagePayments : [{ at: 0, amount: outlay }];
  const templates: Record<OptionKind, OptionTemplate> = {
    expand: { kind: 'expand', id: 'Expand', factor: 0.3, cost: round(v0 * 0.25), window: { kind: 'american', from: 1, to: horizon } },
    contract: {
      kind: 'contract',
      id: 'Contract',
      fraction: 0.3,
      savings: round(0.3 * LATE_VALUE_SHARE * valueAtLastSale),
      window: { kind: 'american', from: Math.min(1, lastSale), to: lastSale },
    },
    abandon: { kind: 'abandon', id: 'Abandon', salvage: round(LATE_VALUE_SHARE * valueAtLastSale), window: { kind: 'american', from: 0, to: lastSale } },
    defer: { kind: 'defer', id: 'Defer', cost: outlay, window: { kind: 'american', from: 0, to: Math.min(2, horizon) } },
    stage: { kind: 'stage', id: 'Stages', payments },
    mothball: {
      kind: 'mothball',
      id: 'Mothball',
      toScale: 0,
      cost: round(v0 * 0.02),
      backCost: round(v0 * 0.04),
      flowPerYear: round(PAUSE_SAVING_SHARE * valueAtLastSale),
      window: { kind: 'american', from: firstEarning, to: lastSale },
    },
  };
  return templateToForm(templates[kind], horizon);
}

type Problems = Record<string, string>;

function readNumber(text: string, path: string, problems: Problems, rule?: (x: number) => string | null): number {
  const read = readNumberText(text);
  if (!read.ok) {
    problems[path] ??= read.message;
    return 0;
  }
  const value = read.value;
  const broken = rule?.(value);
  if (broken) problems[path] ??= broken;
  return value;
}

// A schedule's years are checked here, not by the schema: a cost is a union there, whose refusal
// would name the whole cost instead of the period's field.
const nonNegative = (x: number) => (x < 0 ? 'Must be 0 or more.' : null);

function readCost(form: CostForm, path: string, problems: Problems): Cost {
  if (form.kind === 'constant') return readNumber(form.amount, `${path}.amount`, problems);
  if (form.kind === 'growing')
    return { amount: readNumber(form.amount, `${path}.amount`, problems), growth: readNumber(form.growth, `${path}.growth`, problems) / 100 };
  if (form.schedule.length === 0) problems[`${path}.kind`] = 'Add at least one period to the schedule.';
  const schedule = form.schedule.map((s, k) => ({
    from: readNumber(s.from, `${path}.schedule.${k}.from`, problems, nonNegative),
    amount: readNumber(s.amount, `${path}.schedule.${k}.amount`, problems),
  }));
  schedule.forEach((s, k) => {
    if (k > 0 && s.from <= schedule[k - 1]!.from) problems[`${path}.schedule.${k}.from`] ??= `Must come after year ${schedule[k - 1]!.from}.`;
  });
  return schedule;
}

function readWindow(form: WindowForm, path: string, horizon: number, problems: Problems): ExerciseWindow {
  const inside = (x: number) => (x < 0 || x > horizon + 1e-9 ? `Must lie between year 0 and the horizon, year ${horizon}.` : null);
  if (form.kind === 'american') {
    const from = readNumber(form.from, `${path}.from`, problems, inside);
    const to = readNumber(form.to, `${path}.to`, problems, inside);
    if (from > to) problems[`${path}.to`] ??= 'Must not come before the opening year.';
    return { kind: 'american', from, to };
  }
  if (form.kind === 'european') return { kind: 'european', at: readNumber(form.at, `${path}.at`, problems, inside) };
  const parts = form.dates.split(/[\s,;]+/).filter(Boolean);
  if (parts.length === 0) problems[`${path}.dates`] = 'List at least one date, e.g. 1, 2, 3.';
  const dates = parts.map((p) => readNumber(p, `${path}.dates`, problems, inside));
  return { kind: 'bermudan', dates };
}

/** Every card as an engine template, with the problems of those that do not read (empty when all do). */
export function toTemplates(forms: OptionForm[], horizon: number): { templates: OptionTemplate[]; problems: Problems } {
  const problems: Problems = {};
  const templates = forms.map((f, i): OptionTemplate => {
    const at = `options.${i}`;
    const id = f.label.trim() || undefined;
    const labelsBefore = forms.slice(0, i).map((g) => g.label.trim());
    if (id && labelsBefore.includes(id)) problems[`${at}.label`] = 'Another right already has this name.';
    const window = () => readWindow(f.window, `${at}.window`, horizon, problems);
    // The share's range is the engine schema's (factor, fraction, toScale), checked below with its words.
    const share = () => readNumber(f.share, `${at}.share`, problems) / 100;
    switch (f.kind) {
      case 'expand':
        return {
          kind: 'expand',
          id,
          factor: share(),
          cost: readCost(f.cost, `${at}.cost`, problems),
          window: window(),
        };
      case 'contract':
        return {
          kind: 'contract',
          id,
          fraction: share(),
          savings: readCost(f.cost, `${at}.cost`, problems),
          window: window(),
        };
      case 'abandon':
        return { kind: 'abandon', id, salvage: readCost(f.cost, `${at}.cost`, problems), ...(f.fixedSalvage ? { fixedSalvage: true } : {}), window: window() };
      case 'defer':
        return { kind: 'defer', id, cost: readCost(f.cost, `${at}.cost`, problems), window: window() };
      case 'stage':
        if (f.payments.length === 0) problems[`${at}.payments`] = 'Add at least one payment.';
        return {
          kind: 'stage',
          id,
          payments: f.payments.map((p, k) => ({
            at: readNumber(p.at, `${at}.payments.${k}.at`, problems, (x) => (x < 0 || x > horizon ? `Must lie between year 0 and year ${horizon}.` : null)),
            amount: readNumber(p.amount, `${at}.payments.${k}.amount`, problems),
          })),
        };
      case 'mothball':
        return {
          kind: 'mothball',
          id,
          toScale: share(),
          cost: readCost(f.cost, `${at}.cost`, problems),
          backCost: readCost(f.backCost, `${at}.backCost`, problems),
          flowPerYear: readNumber(f.flowPerYear, `${at}.flowPerYear`, problems),
          window: window(),
        };
    }
  });
  // The engine's own schema has the last word on shapes (the same one the server uses).
  templates.forEach((t, i) => {
    if (Object.keys(problems).some((path) => path.startsWith(`options.${i}.`))) return;
    const parsed = optionTemplateSchema.safeParse(t);
    if (!parsed.success)
      for (const issue of parsed.error.issues) {
        // The card shows factor, fraction and toScale in one "share" field.
        const [first, ...rest] = issue.path.map(String);
        const field = first === 'factor' || first === 'fraction' || first === 'toScale' ? 'share' : first;
        problems[[`options.${i}`, field, ...rest].join('.')] ??= issue.message;
      }
  });
  return { templates, problems };
}
