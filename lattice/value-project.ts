/**
 * `valueProject`: the engine's main entry. One lattice pass gives the value, modes, tree,
 * boundaries and exercise probabilities; unless `extras: false`, re-runs add convergence,
 * sensitivities and each right's stand-alone and incremental value.
 */
import type { CompiledModel } from './compiled';
import { prepareModel } from './check-model';
import { ModelError } from './errors';
import { assertFinite } from './finite';
import { MAX_REQUEST_CELLS, MAX_STEPS, NODE_BUDGET } from './limits';
import { isNeverUsed, isPlanLike, PLAN_LIKE } from './right-usage';
import type { Convergence, Sensitivity, ValuationResult } from './result';
import type { Cost, ExerciseWindow, ProjectModel } from './schema';
import type { Years } from './units';
import { singlePass } from './single-pass';
import { sensitivityBumps, withRights } from './variants';
import { ENGINE_VERSION } from './version';

export interface ValueOptions {
  /** Run the re-runs for convergence, sensitivities and the breakdown (default true). */
  extras?: boolean;
  /**
   * Return the node grid: `true` for every step, or `{ steps: k }` for steps 0..k. Refused when
   * the grid would hold more than NODE_BUDGET (node × mode) cells.
   */
  grid?: boolean | { steps: number };
  /** Return every path of each right with its own boundary (`switches[].paths`); off by default. */
  paths?: boolean;
}

/** Expanded NPV of a variant model, or null when the variant is refused (e.g. p leaves (0,1)). */
function expandedNpvOf(model: ProjectModel): number | null {
  try {
    const { model: checked, compiled } = prepareModel(model);
    return singlePass(checked, compiled, { valueOnly: true }).expandedNpv;
  } catch (error) {
    if (error instanceof ModelError) return null;
    throw error;
  }
}

/**
 * Expanded NPV with only the rights `keep` passes. On the static plan (no defer or stage right
 * left) it is the static NPV plus what the rights add to that plan: the variant's expanded NPV
 * over its own static NPV (docs/engine.md §4, one baseline).
 */
function expandedNpvWith(model: ProjectModel, compiled: CompiledModel, keep: (right: number) => boolean, staticNpv: number): number | null {
  const variant = withRights(model, compiled, keep);
  try {
    const { model: checked, compiled: variantCompiled } = prepareModel(variant.model);
    const pass = singlePass(checked, variantCompiled, { valueOnly: true });
    return variant.onStaticPlan ? staticNpv + (pass.expandedNpv - pass.staticNpv) : pass.expandedNpv;
  } catch (error) {
    if (error instanceof ModelError) return null;
    throw error;
  }
}

/** Every date of the model at which something can happen: windows, payments, payouts, cost steps. */
function modelDates(model: ProjectModel): Years[] {
  const dates: Years[] = [];
  const window = (w: ExerciseWindow | undefined) => {
    if (!w) return;
    if (w.kind === 'american') dates.push(w.from, w.to);
    else if (w.kind === 'bermudan') dates.push(...w.dates);
    else dates.push(w.at);
  };
  const cost = (c: Cost) => {
    if (Array.isArray(c)) dates.push(...c.map((e) => e.from));
  };
  // Every option type names its dates here: the compiler refuses a type left out.
  for (const o of model.options ?? []) {
    switch (o.kind) {
      case 'stage':
        dates.push(...o.payments.map((p) => p.at));
        break;
      case 'expand':
      case 'defer':
        window(o.window);
        cost(o.cost);
        break;
      case 'mothball':
        window(o.window);
        cost(o.cost);
        cost(o.backCost);
        break;
      case 'contract':
        window(o.window);
        cost(o.savings);
        break;
      case 'abandon':
        window(o.window);
        cost(o.salvage);
        break;
      default: {
        const unknown: never = o;
        return unknown;
      }
    }
  }
  for (const sw of model.switches ?? []) {
    window(sw.window);
    cost(sw.cost);
  }
  for (const p of model.underlying.payouts ?? []) dates.push(p.at);
  for (const p of model.underlying.payoutPeriods ?? []) dates.push(p.from, p.to);
  return dates;
}

/** The smallest step count that puts every date on the grid and divides N, or null. */
function gridBase(model: ProjectModel): number | null {
  const dates = modelDates(model);
  const n = model.steps;
  for (let b = 1; b <= n; b++) {
    if (n % b !== 0) continue;
    const dt = model.horizon / b;
    if (dates.every((t) => Math.abs(t / dt - Math.round(t / dt)) < 1e-9 * Math.max(1, t / dt))) return b;
  }
  return null;
}

const BAND_FACTOR = 2;
const WARN_SHARE = 0.01;

/** Volatility of the deterministic limit: the Jarrow–Rudd tree keeps p = ½ at any σ, so 1e-6 is a path. */
const NO_UNCERTAINTY = 1e-6;

/**
 * What the rights add with (almost) no uncertainty: the expanded NPV on a Jarrow–Rudd lattice
 * with σ = 1e-6 minus the static NPV (which does not depend on σ). Null when that is refused.
 */
function deterministicPremium(model: ProjectModel, staticNpv: number): number | null {
  const certain: ProjectModel = { ...model, tree: 'jarrow-rudd', underlying: { ...model.underlying, volatility: NO_UNCERTAINTY } };
  try {
    const { model: checked, compiled } = prepareModel(certain);
    return singlePass(checked, compiled, { valueOnly: true }).expandedNpv - staticNpv;
  } catch (error) {
    if (error instanceof ModelError) return null;
    throw error;
  }
}

function convergenceOf(model: ProjectModel, expandedNpv: number, warnings: string[]): Convergence | null {
  const n = model.steps;
  const base = gridBase(model);
  const below = (target: number) => (base ? Math.floor(target / base) * base : Math.round(target));
  const counts = [...new Set([below(n / 4), below(n / 2)])].filter((k) => k >= 1 && k < n);
  const points: Convergence['points'] = [];
  for (const steps of counts) {
    try {
      const { model: m, compiled } = prepareModel({ ...model, steps });
      points.push({ steps, expandedNpv: singlePass(m, compiled, { valueOnly: true }).expandedNpv });
    } catch (error) {
      if (!(error instanceof ModelError)) throw error;
      warnings.push(`convergence: ${steps} steps were skipped (${error.message})`);
    }
  }
  points.push({ steps: n, expandedNpv });
  const datesOnGrid = base !== null;
  const [first, second] = points.length >= 3 ? points : [undefined, points.length === 2 ? points[0] : undefined];
  if (!second) {
    warnings.push('convergence: no coarser step count keeps every decision date on the grid, so the lattice error is not estimated');
    return { points, extrapolated: expandedNpv, errorEstimate: NaN, band: null, datesOnGrid };
  }
  // Error ∝ 1/N, V_K ≈ V_∞ + c/K: two counts K < L give c = (V_K − V_L)·K·L/(L − K), and the
  // error at N is c/N. From the last pair (M, N) that is (V_M − V_N)·M/(N − M).
  const scaledToN = (a: { steps: number; expandedNpv: number }, b: { steps: number; expandedNpv: number }) =>
    (Math.abs(a.expandedNpv - b.expandedNpv) * a.steps * b.steps) / (n * (b.steps - a.steps));
  const lastChange = scaledToN(second, { steps: n, expandedNpv });
  const earlierChange = first ? scaledToN(first, second) : 0;
  const errorEstimate = Math.max(lastChange, earlierChange);
  const extrapolated = (n * expandedNpv - second.steps * second.expandedNpv) / (n - second.steps);
  const half = BAND_FACTOR * errorEstimate;
  if (half > WARN_SHARE * Math.abs(expandedNpv))
    warnings.push(
      `the lattice error band (± ${half.toPrecision(3)}) is over ${WARN_SHARE * 100} % of the expanded NPV (${expandedNpv.toPrecision(4)}); use more steps`,
    );
  return { points, extrapolated, errorEstimate, band: { low: expandedNpv - half, high: expandedNpv + half }, datesOnGrid };
}

function sensitivitiesOf(model: ProjectModel, compiled: CompiledModel): Sensitivity[] {
  return sensitivityBumps(model, compiled).map((bump) => ({
    parameter: bump.parameter,
    label: bump.label,
    base: bump.base,
    low: { input: bump.low, expandedNpv: expandedNpvOf(bump.apply(model, bump.low)) },
    high: { input: bump.high, expandedNpv: expandedNpvOf(bump.apply(model, bump.high)) },
  }));
}

/**
 * The lattice passes a valuation runs, counted in full passes: the main one and, with extras,
 * the breakdown (two per right when there are several), convergence (N/4 and N/2: 1/16 + 1/4 of
 * a pass), the premium split (one) and two per sensitivity row (V0, σ, r, payouts, each right).
 */
function passesOf(compiled: CompiledModel, extras: boolean): number {
  if (!extras) return 1;
  const rights = compiled.rights.length;
  const rows = 3 + 1 + rights;
  return 1 + (rights > 1 ? 2 * rights : 0) + 0.3125 + 1 + 2 * rows;
}

/** The node × switchable-mode cells a valuation at `steps` visits, every pass counted. */
function cellsAt(steps: number, compiled: CompiledModel, extras: boolean): number {
  const switchable = Math.max(1, new Set(compiled.switches.map((s) => s.from)).size);
  return (((steps + 1) * (steps + 2)) / 2) * switchable * passesOf(compiled, extras);
}

/** The most steps a full valuation (extras included) of this model may use within the budget. */
export function largestStepsWithinBudget(input: unknown): number {
  const { compiled } = prepareModel(input);
  let low = 1;
  let high = MAX_STEPS;
  while (low < high) {
    const mid = Math.ceil((low + high) / 2);
    if (cellsAt(mid, compiled, true) <= MAX_REQUEST_CELLS) low = mid;
    else high = mid - 1;
  }
  return low;
}

export function valueProject(input: unknown, options: ValueOptions = {}): ValuationResult {
  const { model, compiled } = prepareModel(input);
  const cells = cellsAt(model.steps, compiled, options.extras !== false);
  if (cells > MAX_REQUEST_CELLS)
    throw new ModelError([
      {
        field: 'steps',
        message: `with ${compiled.rights.length} rights and ${options.extras !== false ? 'the breakdown, convergence and sensitivities' : 'one pass'} this valuation would visit ${cells.toExponential(2)} node × mode cells, over the budget of ${MAX_REQUEST_CELLS.toExponential(2)}; use fewer steps or fewer rights`,
      },
    ]);
  const gridSteps = options.grid === true ? model.steps : options.grid ? Math.min(options.grid.steps, model.steps) : -1;
  if (gridSteps >= 0) {
    const cells = ((gridSteps + 1) * (gridSteps + 2) * compiled.modes.length) / 2;
    if (cells > NODE_BUDGET)
      throw new ModelError([
        {
          field: 'grid',
          message: `grid of ${gridSteps} steps × ${compiled.modes.length} modes holds ${cells} cells, over the budget of ${NODE_BUDGET}; ask for fewer steps`,
        },
      ]);
  }
  const pass = singlePass(model, compiled, { gridSteps, paths: options.paths === true });
  const warnings: string[] = [];
  let convergence: Convergence | null = null;
  let sensitivities: Sensitivity[] | null = null;
  let premiumSplit: ValuationResult['premiumSplit'] = null;

  if (options.extras !== false) {
    convergence = convergenceOf(model, pass.expandedNpv, warnings);
    const betterPlan = deterministicPremium(model, pass.staticNpv);
    if (betterPlan !== null) premiumSplit = { betterPlan, uncertainty: pass.expandedNpv - pass.staticNpv - betterPlan };
    sensitivities = sensitivitiesOf(model, compiled);
    const count = compiled.rights.length;
    pass.rights.forEach((sw, r) => {
      if (count === 1) {
        sw.standalone = sw.incremental = pass.expandedNpv - pass.staticNpv;
        return;
      }
      const alone = expandedNpvWith(model, compiled, (k) => k === r, pass.staticNpv);
      const others = expandedNpvWith(model, compiled, (k) => k !== r, pass.staticNpv);
      sw.standalone = alone === null ? null : alone - pass.staticNpv;
      sw.incremental = others === null ? null : pass.expandedNpv - others;
    });
  }
  for (const sw of pass.rights) {
    if (isNeverUsed(sw)) warnings.push(`${sw.id} is never exercised on this lattice, so it adds no value as specified`);
    if (isPlanLike(sw))
      warnings.push(
        `${sw.id} is used with probability ${(sw.exerciseProbability * 100).toFixed(1)} % (over ${PLAN_LIKE * 100} %): it works as part of the plan more than as an option; consider putting it in the cash flows`,
      );
  }

  const standalones = pass.rights.map((sw) => sw.standalone);
  const interaction =
    pass.rights.length >= 2 && standalones.every((x) => x !== null) ? pass.expandedNpv - pass.staticNpv - standalones.reduce((sum, x) => sum + x!, 0) : null;
  const { plan } = pass;
  const result: ValuationResult = {
    value: pass.value,
    staticNpv: pass.staticNpv,
    expandedNpv: pass.expandedNpv,
    optionPremium: pass.expandedNpv - pass.staticNpv,
    startMode: compiled.modes[compiled.start]!.id,
    modes: pass.modes,
    rights: pass.rights,
    tree: { kind: plan.kind, steps: plan.steps, u: plan.u, d: plan.d, p: plan.p, dt: plan.dt, discount: plan.discount },
    premiumSplit,
    interaction,
    convergence,
    sensitivities,
    snaps: plan.snaps,
    warnings,
    engineVersion: ENGINE_VERSION,
  };
  if (pass.grid) result.grid = pass.grid;
  assertFinite(result);
  return result;
}
