/**
 * A window onto the lattice shows exactly the nodes of its steps and value band, joined as the
 * lattice joins them, and finds where a right is first used. The model is invented: a project
 * worth 100 with a right to sell it for 80 (an American put on the project's value).
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type NodeGrid, type ProjectModel } from '@/lattice';
import { layoutLatticeTree } from '@/lib/charts/lattice-tree';
import { firstUse, layoutLatticeWindow, levelOf } from '@/lib/charts/lattice-window';

const model: ProjectModel = {
  underlying: { value: 100, volatility: 0.3 },
  riskFreeRate: 0.04,
  horizon: 3,
  steps: 60,
  options: [{ kind: 'abandon', id: 'sale', salvage: 80, window: { kind: 'american', from: 0, to: 3 } }],
};
const result = valueProject(model, { extras: false, grid: true });
const grid = result.grid as NodeGrid;
const mode = result.startMode;

describe('layoutLatticeWindow', () => {
  it('draws the first steps whole, as the first-steps tree does, when the band is wide enough', () => {
    const window = layoutLatticeWindow(grid, mode, { from: 0, steps: 4, centre: 0, halfBand: 6 });
    const tree = layoutLatticeTree(grid, mode, 4);
    expect(window.nodes.map((n) => [n.step, n.node])).toEqual(tree.nodes.map((n) => [n.step, n.node]));
    expect(window.edges).toHaveLength(tree.edges.length);
  });

  it('keeps a deep window to its steps and band, with every edge joining a node to its successors', () => {
    const frame = { from: 40, steps: 5, centre: -2, halfBand: 6 };
    const layout = layoutLatticeWindow(grid, mode, frame);
    for (const n of layout.nodes) {
      expect(n.step).toBeGreaterThanOrEqual(40);
      expect(n.step).toBeLessThanOrEqual(45);
      expect(Math.abs(levelOf(n.step, n.node) - frame.centre)).toBeLessThanOrEqual(6);
      expect(n.underlying).toBe(grid.steps[n.step]!.underlying[n.node]);
    }
    // Six or seven nodes a column: the band's 13 levels hold every other level of a step.
    for (let i = 40; i <= 45; i++) expect(layout.nodes.filter((n) => n.step === i).length).toBeGreaterThanOrEqual(6);
    for (const e of layout.edges) {
      expect(e.to.step).toBe(e.from.step + 1);
      expect([e.from.node, e.from.node + 1]).toContain(e.to.node);
    }
  });
});

describe('firstUse', () => {
  it('finds the earliest step where the right is taken, and no earlier step takes it', () => {
    const found = firstUse(grid, 'sale', mode)!;
    expect(found.mode).toBe(mode);
    expect(grid.steps[found.step]!.modes[mode]!.decision[found.node]).toBe('sale');
    for (let i = 0; i < found.step; i++) expect(grid.steps[i]!.modes[mode]!.decision).not.toContain('sale');
  });

  it('answers null for a right no node takes', () => {
    expect(firstUse(grid, 'no such right', mode)).toBeNull();
  });
});
