/**
 * One lattice pass on a prepared model: the root values, the static and expanded NPV, and per
 * right its exercise probability, timing and boundary. No re-runs happen here.
 */
import type { CompiledModel } from './compiled';
import { costAt } from './cost';
import { exerciseProfiles } from './forward';
import { buildPlan, type LatticePlan } from './plan';
import type { BoundaryPoint, NodeGrid, RightResult } from './result';
import { rollback } from './rollback';
import type { ExerciseWindow, ProjectModel } from './schema';
import { firstOpenStep } from './window';

export interface PassResult {
  plan: LatticePlan;
  value: number;
  staticNpv: number;
  expandedNpv: number;
  modes: Record<string, number>;
  rights: RightResult[];
  grid?: NodeGrid;
}

export interface PassOptions {
  /** Only the root value: no decision map, boundaries or probabilities. */
  valueOnly?: boolean;
  /** Return the node grid for steps 0..gridSteps. */
  gridSteps?: number;
  /** Return every path of each right with its boundary (`RightResult.paths`). */
  paths?: boolean;
}

/**
 * Static NPV: the value of the static plan, committed today. Times snap to the lattice's steps
 * like every decision date, so the plan is one of the strategies the lattice can follow and
 * the expanded NPV is never below it. Entering at step i receives scale·V0·Π_{k<i} kept_k (the
 * project's value after the payouts before i) plus the mode's flows from i on.
 */
function staticNpvOf(plan: LatticePlan, compiled: CompiledModel, riskFreeRate: number): number {
  const { mode, outlays } = compiled.staticPlan;
  const stepOf = (on: ExerciseWindow) => firstOpenStep(on, plan.dt, plan.steps);
  const enter = stepOf(compiled.staticPlan.enter);
  let retained = 1;
  for (let k = 0; k < enter; k++) retained *= plan.kept[k]!;
  const timeOf = (i: number) => i * plan.dt;
  const value = plan.scale[mode]! * plan.lowest[0]! * retained + plan.fixed[mode * (plan.steps + 1) + enter]! * Math.exp(-riskFreeRate * timeOf(enter));
  const outlay = outlays.reduce((sum, o) => sum + costAt(o.cost, timeOf(stepOf(o.on))) * Math.exp(-riskFreeRate * timeOf(stepOf(o.on))), 0);
  return value - outlay;
}

/**
 * The switches a right's first use leads to, in order: from the mode its primary switch enters,
 * the right's own switch out of it, and so on until none is left or a move returns to a mode
 * already passed (a stage right's later payments; a mothball right's restart).
 */
function followUpsOf(compiled: CompiledModel, own: number[], primary: number | undefined): number[] {
  if (primary === undefined) return [];
  const passed = new Set([compiled.switches[primary]!.from]);
  const chain: number[] = [];
  for (let k = primary; !passed.has(compiled.switches[k]!.to);) {
    passed.add(compiled.switches[k]!.to);
    const next = own.find((n) => compiled.switches[n]!.from === compiled.switches[k]!.to);
    if (next === undefined) break;
    chain.push(next);
    k = next;
  }
  return chain;
}

export function singlePass(model: ProjectModel, compiled: CompiledModel, options: PassOptions = {}): PassResult {
  const plan = buildPlan(model, compiled);
  const width = plan.steps + 1;
  const detailed = !options.valueOnly && compiled.switches.length > 0;
  const result = rollback(plan, { decisions: detailed, gridSteps: options.gridSteps ?? -1 });
  const rootOf = (m: number) => plan.scale[m]! * plan.lowest[0]! + plan.fixed[m * width]! + result.rootOption[m]!;
  const value = rootOf(compiled.start);
  const modes: Record<string, number> = {};
  compiled.modes.forEach((mode, m) => (modes[mode.id] = rootOf(m)));

  const rights: RightResult[] = [];
  if (!options.valueOnly) {
    const rightOfSwitch = Int32Array.from(compiled.switches, (s) => s.right);
    const profiles =
      result.decisions && compiled.rights.length > 0
        ? exerciseProfiles(plan, result.decisions, rightOfSwitch, compiled.rights.length, compiled.start)
        : compiled.rights.map(() => ({ probability: 0, byStep: new Float64Array(width) }));
    // Read once per switch: a follow-up's switch is read again for `paths`.
    const read = new Map<number, BoundaryPoint[]>();
    const boundaryOf = (s: number): BoundaryPoint[] => {
      const known = read.get(s);
      if (known) return known;
      const points: BoundaryPoint[] = [];
      read.set(s, points);
      if (!result.boundaryLow || !result.boundaryHigh) return points;
      for (let i = 0; i < width; i++) {
        const lowEdge = result.boundaryLow[s * width + i]!;
        const highEdge = result.boundaryHigh[s * width + i]!;
        if (Number.isNaN(lowEdge) || Number.isNaN(highEdge)) continue;
        const low = Number.isFinite(lowEdge) ? lowEdge : null;
        const high = Number.isFinite(highEdge) ? highEdge : null;
        const side = low === null ? (high === null ? 'anywhere' : 'below') : high === null ? 'above' : 'between';
        points.push({ t: i * plan.dt, critical: side === 'below' ? high : low, side, low, high });
      }
      return points;
    };
    compiled.rights.forEach((right, r) => {
      const own = compiled.switches.flatMap((s, k) => (s.right === r ? [k] : []));
      const primary = own.find((k) => compiled.switches[k]!.from === right.primaryFrom) ?? own[0];
      const profile = profiles[r]!;
      const timing: RightResult['exerciseTiming'] = [];
      profile.byStep.forEach((probability, i) => {
        if (probability > 1e-15) timing.push({ t: i * plan.dt, probability });
      });
      const boundary = primary === undefined ? [] : boundaryOf(primary);
      // A follow-up is reachable only after the decision before it was first possible (a line
      // cannot restart before it could be paused), so its boundary starts after that step.
      let after = boundary[0]?.t ?? Infinity;
      const followUps = followUpsOf(compiled, own, primary).map((k) => {
        const reachable = boundaryOf(k).filter((b) => b.t > after + 1e-12);
        after = reachable[0]?.t ?? Infinity;
        return { from: compiled.modes[compiled.switches[k]!.from]!.id, to: compiled.modes[compiled.switches[k]!.to]!.id, boundary: reachable };
      });
      const paths = options.paths
        ? own.map((k) => ({
            from: compiled.modes[compiled.switches[k]!.from]!.id,
            to: compiled.modes[compiled.switches[k]!.to]!.id,
            boundary: boundaryOf(k),
          }))
        : undefined;
      rights.push({
        id: right.id,
        kind: right.kind,
        standalone: null,
        incremental: null,
        exerciseProbability: profile.probability,
        exerciseTiming: timing,
        boundary,
        ...(followUps.length > 0 ? { followUps } : {}),
        ...(paths ? { paths } : {}),
      });
    });
  }

  let grid: NodeGrid | undefined;
  if (result.grid) {
    grid = { steps: [] };
    result.grid.forEach((rows, i) => {
      const underlying: number[] = [];
      let v = plan.lowest[i]!;
      for (let j = 0; j <= i; j++, v *= plan.u / plan.d) underlying.push(v);
      const entry: NodeGrid['steps'][number] = { t: i * plan.dt, underlying, modes: {} };
      compiled.modes.forEach((mode, m) => {
        const list = plan.byMode[m]!;
        entry.modes[mode.id] = {
          value: underlying.map((vj, j) => plan.scale[m]! * vj + plan.fixed[m * width + i]! + (rows[m]![j] ?? 0)),
          decision: underlying.map((_, j) => {
            const choice = result.decisions ? result.decisions.at(m * width + i, j) : 0;
            return choice === 0 ? null : compiled.rights[compiled.switches[list[choice - 1]!]!.right]!.id;
          }),
        };
      });
      grid!.steps.push(entry);
    });
  }

  const staticNpv = staticNpvOf(plan, compiled, model.riskFreeRate);
  return { plan, value, staticNpv, expandedNpv: value - compiled.upfront, modes, rights, grid };
}
