/**
 * Geometry of the lattice diagram for its first steps: node (i, j) — step i, j up-moves — sits
 * at x = i·dx and y = (i − 2j)·dy/2 from the middle, so up-moves go up and the tree fans out
 * to the right. Each node carries the project's value, the mode's value and the decision taken.
 */
import type { NodeGrid } from '@/lattice';

export interface TreeNode {
  step: number;
  node: number;
  t: number;
  x: number;
  y: number;
  underlying: number;
  value: number;
  decision: string | null;
}

export interface TreeLayout {
  width: number;
  height: number;
  nodes: TreeNode[];
  edges: { from: TreeNode; to: TreeNode }[];
  /** Distinct decisions shown, in order of first appearance. */
  decisions: string[];
}

export const NODE_WIDTH = 112;
export const NODE_HEIGHT = 52;

export function layoutLatticeTree(grid: NodeGrid, mode: string, steps: number): TreeLayout {
  const shown = grid.steps.slice(0, steps + 1);
  const dx = NODE_WIDTH + 44;
  const dy = NODE_HEIGHT + 14;
  const last = shown.length - 1;
  const height = (last + 1) * dy + 24;
  const mid = height / 2;
  const nodes: TreeNode[][] = shown.map((s, i) =>
    s.underlying.map((underlying, j) => ({
      step: i,
      node: j,
      t: s.t,
      x: 16 + i * dx,
      y: mid + ((i - 2 * j) * dy) / 2,
      underlying,
      value: s.modes[mode]?.value[j] ?? NaN,
      decision: s.modes[mode]?.decision[j] ?? null,
    })),
  );
  const edges: TreeLayout['edges'] = [];
  for (let i = 0; i < last; i++) for (const n of nodes[i]!) edges.push({ from: n, to: nodes[i + 1]![n.node]! }, { from: n, to: nodes[i + 1]![n.node + 1]! });
  const flat = nodes.flat();
  const decisions = [...new Set(flat.map((n) => n.decision).filter((d): d is string => d !== null))];
  return { width: 16 + last * dx + NODE_WIDTH + 16, height, nodes: flat, edges, decisions };
}
