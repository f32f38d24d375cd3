/**
 * `valueProject`: the engine's main entry. One lattice pass gives the value, modes, tree,
 * boundaries and exercise probabilities; unless `extras: false`, re-runs add convergence,
 * sensitivities and each right's stand-alone and incremental value.
 */
import type { CompiledModel } from './compiled';
import { prepareModel } from './check-model';
import { ModelError } from './errors';
import { NODE_BUDGET } from './limits';
import type { Convergence, Sensitivity, ValuationResult } from './result';
import type { ProjectModel } from './schema';
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

function convergenceOf(model: ProjectModel, value: number, warnings: string[]): Convergence | null {
  const n = model.steps;
  const counts = [...new Set([Math.round(n / 4), Math.round(n / 2)])].filter((k) => k >= 1 && k < n);
  const points: Convergence['points'] = [];
  for (const steps of counts) {
    try {
      const { model: m, compiled } = prepareModel({ ...model, steps });
      points.push({ steps, value: singlePass(m, compiled, { valueOnly: true }).value });
    } catch (error) {
      if (!(error instanceof ModelError)) throw error;
      warnings.push(`convergence: ${steps} steps were skipped (${error.message})`);
    }
  }
  points.push({ steps: n, value });
  const half = points.find((p) => p.steps === Math.round(n / 2) && p.steps < n);
  if (!half) return { points, extrapolated: value, errorEstimate: NaN };
  const errorEstimate = Math.abs(value - half.value);
  if (errorEstimate > 0.005 * Math.max(Math.abs(value), 1e-12))
    warnings.push(`the value moved by ${errorEstimate.toPrecision(3)} between ${half.steps} and ${n} steps (over 0.5 %); use more steps`);
  return { points, extrapolated: 2 * value - half.value, errorEstimate };
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
 * Refuses to return a result holding NaN or ±Infinity anywhere (errorEstimate may be NaN). The
 * path of a bad number is only spelled out when one is found.
 */
function assertFinite(root: unknown): void {
  const values: unknown[] = [root];
  const parents: number[] = [-1];
  const keys: string[] = [''];
  const pathOf = (k: number): string => {
    const parts: string[] = [];
    for (let at = k; at > 0; at = parents[at]!) parts.unshift(keys[at]!);
    return parts.join('').replace(/^\./, '');
  };
  for (let k = 0; k < values.length; k++) {
    const value = values[k];
    if (typeof value === 'number') {
      if (Number.isFinite(value) || (keys[k] === '.errorEstimate' && Number.isNaN(value))) continue;
      throw new ModelError([{ field: 'model', message: `model produces a non-finite ${pathOf(k)}; check the magnitudes of its inputs` }]);
    }
    if (Array.isArray(value)) {
      for (let j = 0; j < value.length; j++) {
        values.push(value[j]);
        parents.push(k);
        keys.push(`[${j}]`);
      }
    } else if (value !== null && typeof value === 'object') {
      for (const key in value) {
        values.push((value as Record<string, unknown>)[key]);
        parents.push(k);
        keys.push(`.${key}`);
      }
    }
  }
}

export function valueProject(input: unknown, options: ValueOptions = {}): ValuationResult {
  const { model, compiled } = prepareModel(input);
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
  const pass = singlePass(model, compiled, { gridSteps });
  const warnings: string[] = [];
  let convergence: Convergence | null = null;
  let sensitivities: Sensitivity[] | null = null;

  if (options.extras !== false) {
    convergence = convergenceOf(model, pass.value, warnings);
    sensitivities = sensitivitiesOf(model, compiled);
    const count = compiled.rights.length;
    pass.switches.forEach((sw, r) => {
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
  for (const sw of pass.switches) {
    if (sw.exerciseProbability === 0) warnings.push(`${sw.id} is never exercised on this lattice, so it adds no value as specified`);
  }

  const { plan } = pass;
  const result: ValuationResult = {
    value: pass.value,
    staticNpv: pass.staticNpv,
    expandedNpv: pass.expandedNpv,
    optionPremium: pass.expandedNpv - pass.staticNpv,
    startMode: compiled.modes[compiled.start]!.id,
    modes: pass.modes,
    switches: pass.switches,
    tree: { kind: plan.kind, steps: plan.steps, u: plan.u, d: plan.d, p: plan.p, dt: plan.dt, discount: plan.discount },
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
