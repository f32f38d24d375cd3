/**
 * `npm run bench`: the engine's speed, side by side with quantlib.js, in one run on this machine.
 * 1. The same American put (S = K = 100, r = 5 %, σ = 30 %, 1 year) at 1000, 2000 and 5000
 *    steps: the engine (CRR, one pass) and quantlib.js's BinomialVanillaEngine with
 *    CoxRossRubinstein; median of several runs, with the ratio.
 * 2. A full valuation with expand + contract + abandon + defer at 500 steps, including the
 *    stand-alone and incremental breakdown, convergence and sensitivities, and the cost of the
 *    convergence re-runs and of the premium split's σ → 0 run.
 * 3. Rendering the board pack of the demo plant's base case (A4), first and steady.
 * 4. Monte Carlo volatility: paths a second for a ten-year model with three correlated drivers.
 * 5. The cross-check's least-squares Monte Carlo: seconds per 100 000 paths in each pass, on the
 *    demo plant (its own 96 steps) and on the four-option model (500 steps).
 * Section 1 also times a value-only rollback of the same put written in C
 * (scripts/bench/american-put.c, gcc -O2), the yardstick of docs/engine.md §9's goal for the
 * default pass; it is skipped, saying so, where gcc is missing.
 * The script is bundled with esbuild and run by plain node, as the app ships the engine (tsx's
 * on-the-fly loader made the same loops about twice as slow when measured).
 */
import { execFileSync } from 'node:child_process';
import { valueProject, type ProjectModel } from '../lattice';
import fourRights from '../lattice/examples/four-rights.json';
import { prepareModel } from '../lattice/check-model';
import { singlePass } from '../lattice/single-pass';
import { quantlibAmerican } from '../tests/lattice/support/quantlib';
import { demoBoardPackData } from '../demo/board-pack-data';
import { renderBoardPack } from '../lib/board-pack/render';
import { simulateVolatility } from '../lib/volatility/monte-carlo';
import { caseToModel } from '../lib/case-model';
import { leastSquaresMonteCarlo } from '../lib/cross-check/least-squares';
import { readStates } from '../lib/cross-check/modes';
import { demoPortfolio } from '../demo/portfolio';

function median(times: number[]): number {
  const sorted = [...times].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

function time(run: () => unknown, repeats: number): number {
  for (let k = 0; k < 5; k++) run(); // warm-up: let the JIT compile the hot loops first
  const times: number[] = [];
  for (let k = 0; k < repeats; k++) {
    const start = performance.now();
    run();
    times.push(performance.now() - start);
  }
  return median(times);
}

const ms = (x: number) => `${x.toFixed(2).padStart(9)} ms`;

/** The C yardstick, compiled once per run: (steps) => its put value and median time, or null without gcc. */
function nativeRollback(): ((steps: number) => { value: number; ms: number }) | null {
  const binary = '.data/bench-american-put';
  try {
    execFileSync('gcc', ['-O2', '-o', binary, 'scripts/bench/american-put.c', '-lm'], { stdio: 'pipe' });
  } catch {
    return null;
  }
  return (steps) => {
    const [value, median] = execFileSync(binary, [String(steps), '21'], { encoding: 'utf8' })
      .trim()
      .split(' ')
      .map(Number);
    return { value: value!, ms: median! };
  };
}
const native = nativeRollback();

console.log('American put, S = K = 100, r = 5 %, σ = 30 %, T = 1 (median of runs)');
console.log('  engine pass = valueProject(extras: false): value, boundaries and exercise probabilities');
console.log('  engine value = the same lattice, value only (what quantlib.js computes)');
console.log('  C value = the same lattice, value only, in C (gcc -O2): the yardstick of the default pass');
console.log('  steps   engine pass   engine value   quantlib.js (CRR)   ratio pass   ratio value        C value   pass ÷ C');
if (!native) console.log('  (gcc not found: the C yardstick is skipped)');
for (const steps of [1000, 2000, 5000]) {
  const model: ProjectModel = {
    underlying: { value: 100, volatility: 0.3 },
    riskFreeRate: 0.05,
    horizon: 1,
    steps,
    options: [{ kind: 'abandon', salvage: 100, window: { kind: 'american', from: 0, to: 1 } }],
  };
  const engine = time(() => valueProject(model, { extras: false }), 21);
  const prepared = prepareModel(model);
  const valueOnly = time(() => singlePass(prepared.model, prepared.compiled, { valueOnly: true }), 21);
  const quantlib = time(
    () => quantlibAmerican({ kind: 'put', spot: 100, strike: 100, rate: 0.05, dividendYield: 0, volatility: 0.3, days: 365, steps, tree: 'crr' }),
    steps >= 5000 ? 5 : 11,
  );
  const c = native?.(steps);
  // The C put must be the engine's put: an abandon-only project is V0 + the put (docs/engine.md §7).
  const engineValue = valueProject(model, { extras: false }).value - 100;
  if (c && Math.abs(c.value - engineValue) > 1e-9 * 100) throw new Error(`bench: the C put is ${c.value}, the engine's ${engineValue}`);
  const yardstick = c ? `   ${ms(c.ms)}   ${(engine / c.ms).toFixed(1).padStart(6)}×` : '';
  console.log(
    `  ${String(steps).padStart(5)} ${ms(engine)}   ${ms(valueOnly)}   ${ms(quantlib)}      ${(quantlib / engine).toFixed(1).padStart(6)}×     ${(quantlib / valueOnly).toFixed(1).padStart(6)}×${yardstick}`,
  );
}

// The benchmark model, shared with `npm run load` (invented figures).
const fourOptions = fourRights as ProjectModel;
const single = time(() => valueProject(fourOptions, { extras: false }), 21);
const full = time(() => valueProject(fourOptions), 11);
console.log('\nFour options (defer, expand, contract, abandon), 500 steps, 6 modes');
console.log(`  one lattice pass (extras: false)                          ${ms(single)}`);
console.log(`  full valuation with breakdown, convergence, sensitivities ${ms(full)}`);
// The extras' parts, as valueProject runs them: convergence re-values at two coarser counts that
// keep every date on the grid (here 125 and 250), the premium split once on a σ → 0 Jarrow–Rudd path.
const passAt = (model: ProjectModel) => {
  const prepared = prepareModel(model);
  return () => singlePass(prepared.model, prepared.compiled, { valueOnly: true });
};
const coarse = [passAt({ ...fourOptions, steps: 125 }), passAt({ ...fourOptions, steps: 250 })];
const convergenceCost = time(() => coarse.forEach((run) => run()), 21);
const certain = passAt({ ...fourOptions, tree: 'jarrow-rudd', underlying: { ...fourOptions.underlying, volatility: 1e-6 } });
const splitCost = time(certain, 21);
console.log(`  of which convergence (two coarser lattices)               ${ms(convergenceCost)}`);
console.log(`  of which the premium split (one σ → 0 lattice)            ${ms(splitCost)}`);

// 3. The board pack of the demo plant's base case, as the approval renders it (in its worker).
// The valuation is part of the measured work, as in the approval's job.
const packData = () => demoBoardPackData('A4');
const firstStart = performance.now();
await renderBoardPack(packData());
const first = performance.now() - firstStart;
const packTimes: number[] = [];
for (let k = 0; k < 5; k++) {
  const start = performance.now();
  await renderBoardPack(packData());
  packTimes.push(performance.now() - start);
}
console.log('\nBoard pack of the demo plant base case (A4, 5 pages, valuation included)');
console.log(`  first render (fonts loaded)                               ${ms(first)}`);
console.log(`  later renders (median of 5)                               ${ms(median(packTimes))}`);

// 4. Monte Carlo volatility, ten years, three correlated drivers (as the worker runs it).
const tenYears = {
  wacc: 0.09,
  rows: Array.from({ length: 11 }, (_, year) => ({
    year,
    revenue: year ? 100 : 0,
    operatingCost: year ? 55 : 0,
    tax: year ? 10 : 0,
    workingCapital: year ? 2 : 0,
    capex: year ? 0 : 300,
  })),
};
const mcSpec = {
  drivers: [
    { line: 'revenue' as const, distribution: 'lognormal' as const, spread: 0.2 },
    { line: 'operatingCost' as const, distribution: 'triangular' as const, spread: 0.1 },
    { line: 'tax' as const, distribution: 'normal' as const, spread: 0.1 },
  ],
  correlations: [0.5, 0.3, 0.2],
  paths: 200_000,
  seed: 1,
};
simulateVolatility(tenYears, { ...mcSpec, paths: 20_000 }); // warm-up
const mcStart = performance.now();
simulateVolatility(tenYears, mcSpec);
const mcSeconds = (performance.now() - mcStart) / 1000;
console.log('\nMonte Carlo volatility, 10 years, 3 correlated drivers, both methods');
console.log(
  `  ${mcSpec.paths.toLocaleString('en-GB')} paths in ${(mcSeconds * 1000).toFixed(0)} ms: ${Math.round(mcSpec.paths / mcSeconds).toLocaleString('en-GB')} paths a second`,
);

// The cross-check's least-squares Monte Carlo (lib/cross-check/), per 100 000 paths in each pass.
const plantModel = caseToModel(demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!).model;
const crossStates = readStates(plantModel);
const crossStart = performance.now();
const cross = leastSquaresMonteCarlo(plantModel, { paths: 100_000, seed: 1 });
const crossSeconds = (performance.now() - crossStart) / 1000;
const fourStart = performance.now();
leastSquaresMonteCarlo(fourOptions, { paths: 20_000, seed: 1 });
const fourSeconds = ((performance.now() - fourStart) / 1000) * 5;
const fourStates = readStates(fourOptions);
console.log('\nCross-check (least-squares Monte Carlo), time per 100 000 paths in each pass');
console.log(
  `  demo plant: ${plantModel.steps + 1} dates, ${crossStates.states.length} states, ${crossStates.moves.length} moves   ${crossSeconds.toFixed(2).padStart(7)} s  (low ${cross.lowBiased.expandedNpv.toFixed(3)} ± ${cross.lowBiased.standardError.toFixed(3)})`,
);
console.log(
  `  four options: ${fourOptions.steps + 1} dates, ${fourStates.states.length} states, ${fourStates.moves.length} moves   ${fourSeconds.toFixed(2).padStart(7)} s  (measured on 20 000 paths × 5)`,
);
