import { jStat } from 'jstat';
import type { NodeGrid } from '@/lattice';

/**
 * The share of risk-neutral probability left out of the decision map on each side of a step.
 * A 100-step tree spans far more than the project can reasonably reach: the demo plant's top
 * node in year 7 is some 1,600 times today's value, and after the last year's payout every
 * node is worth almost nothing. Drawn whole on a log scale, those nodes took most of the
 * chart's height and squeezed the regions where rights are used into a sliver.
 */
export const MAP_TAIL = 1e-4;

export interface MapCell {
  step: number;
  t: number;
  value: number;
  decision: string | null;
}

export interface DecisionMapLayout {
  /** The nodes drawn: at each step, those inside the central 1 − 2·MAP_TAIL of probability. */
  cells: MapCell[];
  /** The value axis: the drawn nodes' range up to the last step where this mode decides anything. */
  values: [number, number];
  /** The last step of that range (the whole lattice when this mode decides nothing after today). */
  lastDecision: number;
}

/**
 * Lays out one mode's decision map. At step i a node with j up-moves is reached with the
 * binomial probability C(i, j)·p^j·(1 − p)^(i − j) (payouts move nodes, not p: docs/engine.md
 * §3), and the nodes left out at each end carry at most `tail` of it. The value axis fits the
 * steps up to the last one where this mode uses a right; later nodes outside it (the spread
 * grows, and the last year's payout drains the project) are clipped at the chart's edges.
 */
export function decisionMapLayout(grid: NodeGrid, mode: string, p: number, tail = MAP_TAIL): DecisionMapLayout {
  const cells: MapCell[] = [];
  let lastDecision = -1;
  grid.steps.forEach((s, i) => {
    const decisions = s.modes[mode]?.decision ?? [];
    const [low, high] = likelyNodes(i, p, tail);
    for (let j = low; j <= high; j++) {
      const decision = decisions[j] ?? null;
      cells.push({ step: i, t: s.t, value: s.underlying[j]!, decision });
      if (decision !== null) lastDecision = i;
    }
  });
  // A mode decided only today (a stage payment due now) has one node to fit: it gets the whole
  // lattice, as a mode that only continues does.
  if (lastDecision <= 0) lastDecision = grid.steps.length - 1;
  const values = cells.filter((c) => c.step <= lastDecision).map((c) => c.value);
  return { cells, values: [Math.min(...values), Math.max(...values)], lastDecision };
}

/** The first and last node index of step i that leave at most `tail` of probability beyond them. */
export function likelyNodes(i: number, p: number, tail: number): [number, number] {
  const cdf = (j: number) => jStat.binomial.cdf(j, i, p);
  return [firstWhere(i, (j) => cdf(j) > tail), firstWhere(i, (j) => cdf(j) >= 1 - tail)];
}

/** The least j in 0…n where `holds` is true, for a test that stays true once it is (true at n). */
function firstWhere(n: number, holds: (j: number) => boolean): number {
  let [low, high] = [0, n];
  while (low < high) {
    const mid = (low + high) >> 1;
    if (holds(mid)) high = mid;
    else low = mid + 1;
  }
  return low;
}
