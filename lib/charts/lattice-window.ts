/**
 * Geometry of a window onto the lattice: steps `from`..`from + steps` and a band of project values
 * around a centre, so any part of a lattice of hundreds of steps can be drawn at a legible size.
 * A node's level is L = i − 2j (step i, j up-moves): its project value is V₀·u^(−L), so L = 0 is
 * today's value and equal levels are equal values across steps. The band keeps the levels within
 * `halfBand` of the centre; up-moves go up the screen and time runs to the right.
 */
import type { NodeGrid } from '@/lattice';
import { NODE_HEIGHT, NODE_WIDTH, type TreeLayout, type TreeNode } from './lattice-tree';

export interface LatticeWindow {
  /** First step shown. */
  from: number;
  /** Steps shown after it. */
  steps: number;
  /** The level at the middle of the band. */
  centre: number;
  /** Levels shown each side of the centre. */
  halfBand: number;
}

export const levelOf = (step: number, node: number) => step - 2 * node;

export function layoutLatticeWindow(grid: NodeGrid, mode: string, window: LatticeWindow): TreeLayout {
  const dx = NODE_WIDTH + 44;
  const dy = NODE_HEIGHT + 14;
  const last = Math.min(grid.steps.length - 1, window.from + window.steps);
  const top = 12;
  const columns: TreeNode[][] = [];
  for (let i = window.from; i <= last; i++) {
    const s = grid.steps[i]!;
    const column: TreeNode[] = [];
    s.underlying.forEach((underlying, j) => {
      const level = levelOf(i, j);
      if (Math.abs(level - window.centre) > window.halfBand) return;
      column.push({
        step: i,
        node: j,
        t: s.t,
        x: 16 + (i - window.from) * dx,
        // The highest level (lowest value) at the bottom.
        y: top + NODE_HEIGHT / 2 + ((level - window.centre + window.halfBand) * dy) / 2,
        underlying,
        value: s.modes[mode]?.value[j] ?? NaN,
        decision: s.modes[mode]?.decision[j] ?? null,
      });
    });
    columns.push(column);
  }
  const edges: TreeLayout['edges'] = [];
  for (let k = 0; k + 1 < columns.length; k++) {
    const next = new Map(columns[k + 1]!.map((n) => [n.node, n]));
    for (const n of columns[k]!) for (const to of [next.get(n.node), next.get(n.node + 1)]) if (to) edges.push({ from: n, to });
  }
  const nodes = columns.flat();
  const decisions = [...new Set(nodes.map((n) => n.decision).filter((d): d is string => d !== null))];
  const width = 16 + (columns.length - 1) * dx + NODE_WIDTH + 16;
  const height = top * 2 + NODE_HEIGHT + window.halfBand * dy;
  return { width, height, nodes, edges, decisions };
}

/**
 * The first node, in time, where `decision` is taken: in `mode` if it is taken there, otherwise
 * in the first mode that takes it. Null when no node of the grid takes it.
 */
export function firstUse(grid: NodeGrid, decision: string, preferredMode: string): { mode: string; step: number; node: number } | null {
  const modes = [preferredMode, ...Object.keys(grid.steps[0]?.modes ?? {}).filter((m) => m !== preferredMode)];
  for (const mode of modes)
    for (let i = 0; i < grid.steps.length; i++) {
      const j = grid.steps[i]!.modes[mode]?.decision.indexOf(decision) ?? -1;
      if (j >= 0) return { mode, step: i, node: j };
    }
  return null;
}
