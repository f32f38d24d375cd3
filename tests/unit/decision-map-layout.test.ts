/**
 * The decision map draws the nodes a project is likely to reach, not the whole tree. Drawn
 * whole, the demo plant's map spent most of its height on nodes worth over a thousand times
 * today's value or, after the last year's payout, almost nothing; the regions where Phase 2 and
 * the sale are used were a band in the top third, and the value axis was labelled only "1" and
 * "10⁻⁵". Probabilities here are summed in the test from C(i, j)·p^j·(1 − p)^(i−j) in logs,
 * apart from jStat, which the layout uses. Tolerances are rounding.
 */
import { describe, expect, it } from 'vitest';
import { valueProject } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { caseToModel } from '@/lib/case-model';
import { decisionMapLayout, likelyNodes, MAP_TAIL } from '@/lib/charts/decision-map';

/** P(J = j) for J binomial(i, p), from log-factorials summed in the test. */
function pmf(i: number, p: number): number[] {
  const logFactorial = [0];
  for (let k = 1; k <= i; k++) logFactorial.push(logFactorial[k - 1]! + Math.log(k));
  return Array.from({ length: i + 1 }, (_, j) =>
    Math.exp(logFactorial[i]! - logFactorial[j]! - logFactorial[i - j]! + j * Math.log(p) + (i - j) * Math.log(1 - p)),
  );
}
const sum = (xs: number[]) => xs.reduce((a, b) => a + b, 0);

describe('the decision map layout', () => {
  it('leaves out at most the tail at each end of a step, and no node it needs', () => {
    for (const [i, p] of [
      [0, 0.5],
      [1, 0.5],
      [12, 0.3],
      [96, 0.49],
      [250, 0.52],
      [600, 0.5],
    ] as const) {
      const probability = pmf(i, p);
      const [low, high] = likelyNodes(i, p, MAP_TAIL);
      expect(low).toBeLessThanOrEqual(high);
      // The nodes left out below `low` and above `high` carry at most the tail each...
      expect(sum(probability.slice(0, low))).toBeLessThanOrEqual(MAP_TAIL + 1e-12);
      expect(sum(probability.slice(high + 1))).toBeLessThanOrEqual(MAP_TAIL + 1e-12);
      // ...and leaving out one more node at either end would leave out more than that.
      if (low < i) expect(sum(probability.slice(0, low + 1))).toBeGreaterThan(MAP_TAIL - 1e-12);
      if (high > 0) expect(sum(probability.slice(high))).toBeGreaterThan(MAP_TAIL - 1e-12);
    }
  });

  it("fits the demo plant's map to the years where its rights are used", () => {
    const plant = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
    const { model } = caseToModel(plant);
    const result = valueProject(model, { extras: false, grid: true });
    const grid = result.grid!;
    const layout = decisionMapLayout(grid, 'operating', result.tree.p);
    // The sale can be used until year 7, the last step at or before it (docs/engine.md §2).
    const lastSale = Math.max(...grid.steps.flatMap((s, i) => (s.modes.operating!.decision.some((d) => d !== null) ? [i] : [])));
    expect(layout.lastDecision).toBe(lastSale);
    expect(grid.steps[lastSale]!.t).toBeLessThanOrEqual(7 + 1e-9);
    // Every cell up to there lies on the value axis; later ones may leave it at its foot.
    for (const c of layout.cells.filter((c) => c.step <= lastSale)) {
      expect(c.value).toBeGreaterThanOrEqual(layout.values[0]);
      expect(c.value).toBeLessThanOrEqual(layout.values[1]);
    }
    // The axis spans far less than the whole tree did (over 10⁻⁸ to 10⁵, measured 2026-12-05)...
    const all = grid.steps.flatMap((s) => s.underlying);
    expect(Math.log10(layout.values[1] / layout.values[0])).toBeLessThan(Math.log10(Math.max(...all) / Math.min(...all)) / 3);
    // ...and still holds today's value and every node where a right is used with any likelihood.
    expect(layout.values[0]).toBeLessThan(model.underlying.value);
    expect(layout.values[1]).toBeGreaterThan(model.underlying.value);
    expect(new Set(layout.cells.flatMap((c) => (c.decision ? [c.decision] : [])))).toEqual(new Set(['Phase 2', 'Sell the plant']));
  });

  it('fits a mode decided only today to the whole horizon, not to one node', () => {
    // The staged pilot line's first payment is due today: fitted to step 0 alone, the axis was
    // the single value 66.4, and a log scale over one value places nothing.
    const pilot = demoPortfolio.find((p) => p.name === 'Staged pilot line')!.cases[0]!;
    const { model } = caseToModel(pilot);
    const result = valueProject(model, { extras: false, grid: true });
    const mode = Object.keys(result.grid!.steps[0]!.modes).find((m) => result.grid!.steps[0]!.modes[m]!.decision.some((d) => d !== null))!;
    expect(result.grid!.steps.slice(1).every((s) => s.modes[mode]!.decision.every((d) => d === null))).toBe(true);
    const layout = decisionMapLayout(result.grid!, mode, result.tree.p);
    expect(layout.lastDecision).toBe(model.steps);
    expect(layout.values[1]).toBeGreaterThan(layout.values[0]);
  });

  it('fits a mode that only continues to the whole horizon', () => {
    const plant = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
    const { model } = caseToModel({ ...plant, options: [] });
    const result = valueProject(model, { extras: false, grid: true });
    const layout = decisionMapLayout(result.grid!, result.startMode, result.tree.p);
    expect(layout.lastDecision).toBe(model.steps);
    expect(layout.cells.every((c) => c.decision === null)).toBe(true);
    const values = layout.cells.map((c) => c.value);
    expect(layout.values).toEqual([Math.min(...values), Math.max(...values)]);
  });
});
