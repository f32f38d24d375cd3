/**
 * The in-product cross-check (lib/cross-check/, docs/engine.md §11): an independent
 * least-squares Monte Carlo (Longstaff & Schwartz 2001, RFS 14(1)) compared with the lattice.
 * - Published: Longstaff & Schwartz's Table 1 (the shared reference copy in
 *   tests/lattice/reference/): the finite-difference American put lies within the Monte Carlo's
 *   own stated range [low − 3·SE, high + 3·SE], on their 50 exercise dates a year.
 * - Closed form: a European expansion of a project paying a yield is factor × a Black–Scholes
 *   call on the value net of its payouts (`black-scholes` npm package; Black & Scholes 1973),
 *   within three standard errors.
 * - The demo cases: the verdict agrees with the lattice's value and convergence band.
 * - A mis-specified pair (the lattice on one volatility, the Monte Carlo on another) disagrees,
 *   and says by how much.
 * Seeded throughout; every tolerance is the Monte Carlo's own standard error.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { ProjectModel } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { caseToModel } from '@/lib/case-model';
import { leastSquaresMonteCarlo } from '@/lib/cross-check/least-squares';
import { runCrossCheck, latticeFigures, tooMuchWork } from '@/lib/cross-check/run';
import { judge } from '@/lib/cross-check/verdict';

const require = createRequire(import.meta.url);
const { blackScholes } = require('black-scholes') as {
  blackScholes: (s: number, k: number, t: number, v: number, r: number, callPut: 'call' | 'put') => number;
};

const csv = readFileSync(fileURLToPath(new URL('../lattice/reference/longstaff-schwartz-2001-table1.csv', import.meta.url)), 'utf8');
const table = csv
  .split('\n')
  .filter((line) => line.trim() !== '' && !line.startsWith('#') && !line.startsWith('S,'))
  .map((line) => {
    const [S, sigma, T, fd] = line.split(',').map(Number) as [number, number, number, number];
    return { S, sigma, T, fd };
  });

describe('cross-check: least-squares Monte Carlo', () => {
  it.each(table)('Longstaff & Schwartz Table 1: American put S=$S σ=$sigma T=$T ≈ $fd', ({ S, sigma, T, fd }) => {
    // The put as a project: hold V, with the right to sell it for 40 (a fixed amount) on 50 dates a year.
    const model: ProjectModel = {
      underlying: { value: S, volatility: sigma },
      riskFreeRate: 0.06,
      horizon: T,
      steps: 50 * T,
      options: [{ kind: 'abandon', salvage: 40, fixedSalvage: true, window: { kind: 'american', from: 0, to: T } }],
    };
    const mc = leastSquaresMonteCarlo(model, { paths: 20_000, seed: 2001 });
    const published = { expandedNpv: S + fd, band: null, steps: 50 * T, engineVersion: 'Longstaff & Schwartz 2001, Table 1', rights: [] };
    const verdict = judge(published, mc);
    expect(verdict.agrees, JSON.stringify({ fd, low: mc.lowBiased, high: mc.highBiased })).toBe(true);
    // Both estimates are informative: their standard errors are a small part of the put.
    expect(mc.lowBiased.standardError).toBeLessThan(0.01 * fd + 0.02);
  });

  it('a European expansion of a project paying a yield is a Black–Scholes call on the value net of payouts', () => {
    const V0 = 100;
    const [sigma, r, delta, T, factor, cost] = [0.3, 0.05, 0.04, 2, 0.5, 60];
    const model: ProjectModel = {
      underlying: { value: V0, volatility: sigma, payoutYield: delta },
      riskFreeRate: r,
      horizon: T,
      steps: 20,
      options: [{ kind: 'expand', factor, cost, window: { kind: 'european', at: T } }],
    };
    const mc = leastSquaresMonteCarlo(model, { paths: 40_000, seed: 73 });
    const expected = V0 + factor * blackScholes(V0 * Math.exp(-delta * T), cost / factor, T, sigma, r, 'call');
    // With one date there is no rule to fit: both passes are plain Monte Carlo estimates.
    for (const estimate of [mc.lowBiased, mc.highBiased]) expect(Math.abs(estimate.expandedNpv - expected)).toBeLessThan(3 * estimate.standardError);
  });

  const demoCases = demoPortfolio.flatMap((project) => project.cases.map((c) => ({ name: `${project.name}: ${c.name}`, c })));
  it.each(demoCases)('agrees with the lattice on the demo case $name', ({ c }) => {
    const { model } = caseToModel(c);
    const result = runCrossCheck(model, { paths: 20_000, seed: 11 });
    expect(result.verdict.agrees, JSON.stringify(result.verdict)).toBe(true);
    expect(result.verdict.rights.filter((r) => r.differs)).toEqual([]);
    expect(result.lattice.expandedNpv).toBe(latticeFigures(model).expandedNpv);
  });

  it('disagrees visibly with a lattice valued at another volatility, and says by how much', () => {
    const plant = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
    const { model } = caseToModel(plant);
    const wrong: ProjectModel = { ...model, underlying: { ...model.underlying, volatility: model.underlying.volatility * 1.5 } };
    const verdict = judge(latticeFigures(wrong), leastSquaresMonteCarlo(model, { paths: 20_000, seed: 11 }));
    expect(verdict.agrees).toBe(false);
    expect(verdict.gap).toBeGreaterThan(0);
    expect(verdict.difference).toBeGreaterThan(verdict.gap);
  });

  it('is reproducible from its seed, and another seed gives another sample', () => {
    const { model } = caseToModel(demoPortfolio[1]!.cases[0]!);
    const a = leastSquaresMonteCarlo(model, { paths: 4_000, seed: 5 });
    expect(leastSquaresMonteCarlo(model, { paths: 4_000, seed: 5 })).toEqual(a);
    expect(leastSquaresMonteCarlo(model, { paths: 4_000, seed: 6 }).lowBiased.expandedNpv).not.toBe(a.lowBiased.expandedNpv);
  });

  it('refuses a run beyond its work bound, naming the paths that fit', () => {
    const { model } = caseToModel(demoPortfolio[0]!.cases[0]!);
    expect(tooMuchWork(model, 20_000)).toBeNull();
    expect(tooMuchWork({ ...model, steps: 10_000 }, 200_000)).toMatch(/use at most [\d,]+ paths/);
  });
});
