/**
 * explainNode (docs/engine.md §6): at every node the value is the risk-neutral expectation and the
 * cost of the replicating position Δ·(V − payout) + B, which must agree to rounding on trees
 * that match the first moment (CRR, Tian). The one-period replication argument is common
 * practice, no source beyond Cox, Ross & Rubinstein (1979). Tolerance 1e-9 relative.
 */
import { describe, expect, it } from 'vitest';
import { explainNode, valueProject, type ProjectModel } from '@/lattice';
import { expectClose } from './support/check';

const model: ProjectModel = {
  underlying: { value: 100, volatility: 0.35, payoutYield: 0.03 },
  riskFreeRate: 0.05,
  horizon: 4,
  steps: 12,
  options: [
    { kind: 'expand', factor: 0.4, cost: 35, window: { kind: 'american', from: 1, to: 4 } },
    { kind: 'abandon', salvage: 60, window: { kind: 'american', from: 0, to: 4 } },
  ],
};

describe('explainNode', () => {
  it.each(['crr', 'tian'] as const)('on %s, expectation, replication and value agree at every node', (tree) => {
    for (const step of [0, 3, 7, 11])
      for (let node = 0; node <= step; node++)
        for (const mode of ['operating', 'operating+expand-1']) {
          const e = explainNode({ ...model, tree }, { step, node, mode });
          const one = e.oneStep!;
          const scale = Math.max(1, Math.abs(e.value));
          expectClose(one.replicatingCost, one.expectation, { abs: 1e-9 * scale }, { tree, step, node, mode });
          expectClose(e.cashAtNode + one.expectation, e.continuation, { abs: 1e-9 * scale }, { tree, step, node, mode });
          expectClose(e.value, Math.max(e.continuation, ...e.alternatives.map((a) => a.worth)), { abs: 1e-12 * scale }, { step, node });
        }
  });

  it('the root explanation matches valueProject', () => {
    const e = explainNode(model, { step: 0, node: 0, mode: 'operating' });
    expectClose(e.value, valueProject(model, { extras: false }).value, { rel: 1e-12 }, {});
  });

  it('on Jarrow–Rudd reports the drift correction it applies, which shrinks with Δt', () => {
    const coarse = explainNode({ ...model, tree: 'jarrow-rudd' }, { step: 3, node: 2, mode: 'operating' });
    const fine = explainNode({ ...model, tree: 'jarrow-rudd', steps: 48 }, { step: 12, node: 8, mode: 'operating' });
    expect(Math.abs(coarse.oneStep!.driftCorrection)).toBeGreaterThan(0);
    expect(Math.abs(fine.oneStep!.driftCorrection)).toBeLessThan(Math.abs(coarse.oneStep!.driftCorrection));
  });

  it('refuses a node outside the tree and an unknown mode', () => {
    expect(() => explainNode(model, { step: 13, node: 0, mode: 'operating' })).toThrow('step must be a whole number from 0 to 12, got 13');
    expect(() => explainNode(model, { step: 2, node: 3, mode: 'operating' })).toThrow('node must be a whole number from 0 to 2, got 3');
    expect(() => explainNode(model, { step: 2, node: 1, mode: 'idle' })).toThrow('mode must be one of');
  });
});
