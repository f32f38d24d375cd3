/**
 * One cross-check: the lattice values the model (with its convergence band), the least-squares
 * Monte Carlo values it again on its own code path, and the verdict compares them. Runs in a
 * worker thread (./worker-entry.ts); pure apart from the clock.
 */
import { parseModel, valueProject, type ProjectModel } from '@/lattice';
import { leastSquaresMonteCarlo, type CrossCheckSpec, type MonteCarloResult } from './least-squares';
import { MAX_CROSS_CHECK_WORK } from './limits';
import { readStates } from './modes';
import { judge, type LatticeFigures, type Verdict } from './verdict';

export interface CrossCheckResult {
  lattice: LatticeFigures;
  monteCarlo: MonteCarloResult;
  verdict: Verdict;
  /** Wall-clock seconds of the Monte Carlo alone. */
  seconds: number;
}

/** The work a cross-check of this model would do, in path × date × (state + move) units. */
export function crossCheckWork(model: ProjectModel, paths: number): number {
  const graph = readStates(model);
  return paths * (model.steps + 1) * (graph.states.length + graph.moves.length);
}

export function latticeFigures(model: ProjectModel): LatticeFigures {
  const result = valueProject(model);
  return {
    expandedNpv: result.expandedNpv,
    band: result.convergence?.band ?? null,
    steps: result.tree.steps,
    engineVersion: result.engineVersion,
    rights: result.rights.map((s) => ({ id: s.id, exerciseProbability: s.exerciseProbability })),
  };
}

/** Null when the cross-check fits the work bound, otherwise what to do instead. */
export function tooMuchWork(model: ProjectModel, paths: number): string | null {
  const work = crossCheckWork(model, paths);
  if (work <= MAX_CROSS_CHECK_WORK) return null;
  const most = Math.floor((paths * MAX_CROSS_CHECK_WORK) / work / 2) * 2;
  return `This cross-check is too large for one run: use at most ${most.toLocaleString('en-GB')} paths, or fewer steps.`;
}

export function runCrossCheck(input: unknown, spec: CrossCheckSpec, onProgress?: (fraction: number) => void): CrossCheckResult {
  const model = parseModel(input);
  // Valued first: the lattice refuses a model that breaks the contract, with the field named.
  const lattice = latticeFigures(model);
  const refusal = tooMuchWork(model, spec.paths);
  if (refusal) throw new Error(refusal);
  const started = performance.now();
  const monteCarlo = leastSquaresMonteCarlo(model, spec, onProgress);
  return { lattice, monteCarlo, verdict: judge(lattice, monteCarlo), seconds: (performance.now() - started) / 1000 };
}
