/**
 * Same-tree comparison with quantlib.js (`@quantlib/ql` 0.3.6, a port of QuantLib's
 * BinomialVanillaEngine). An abandon-only project is V0 plus an American put with strike =
 * salvage and dividend yield δ; a defer-only project is an American call with strike = cost
 * (docs/engine.md §7). On Jarrow–Rudd, Tian and Trigeorgis both sides run the same recursion on the
 * same nodes, so the tolerance is 1e-9 relative (measured: about 1e-12).
 *
 * CRR: quantlib.js uses the first-order probability p = ½ + ½·(r − δ − σ²/2)·√Δt/σ instead of
 * the exact (e^{(r−δ)Δt} − d)/(u − d); docs/engine.md §7 notes the prices then differ by O(Δt). The
 * tolerance is 0.02·K·Δt (K the strike, Δt in years): on this grid the largest measured
 * |difference|/(K·Δt) was 0.0072 (σ = 0.6, 120 steps over 2 years), so the bound has a margin of
 * about 3 and shrinks in proportion to Δt as steps grow.
 */
import { describe, it } from 'vitest';
import { valueProject } from '@/lattice';
import { expectClose } from './support/check';
import { abandonOnly, deferOnly, type VanillaCase } from './support/models';
import { quantlibAmerican, type QuantLibTree } from './support/quantlib';

const grid: Omit<VanillaCase, 'tree'>[] = [];
for (const value of [80, 100, 125])
  for (const volatility of [0.15, 0.35, 0.6])
    for (const [days, steps] of [
      [365, 25],
      [730, 120],
      [365, 500],
    ] as const)
      for (const payoutYield of [0, 0.04]) grid.push({ value, strike: 100, rate: 0.05, volatility, horizon: days / 365, steps, payoutYield });

function quote(kind: 'call' | 'put', c: Omit<VanillaCase, 'tree'>, tree: QuantLibTree) {
  return quantlibAmerican({
    kind,
    spot: c.value,
    strike: c.strike,
    rate: c.rate,
    dividendYield: c.payoutYield ?? 0,
    volatility: c.volatility,
    days: Math.round(c.horizon * 365),
    steps: c.steps,
    tree,
  });
}

describe.each(['jarrow-rudd', 'tian', 'trigeorgis'] as const)('on the %s tree, at the same step count as quantlib.js', (tree) => {
  it('an abandon-only project equals V0 plus an American put', () => {
    for (const c of grid) {
      const engine = valueProject(abandonOnly({ ...c, tree }), { extras: false }).value - c.value;
      expectClose(engine, quote('put', c, tree), { rel: 1e-9, abs: 1e-11 }, { tree, ...c });
    }
  });
  it('a defer-only project equals an American call', () => {
    for (const c of grid) {
      const engine = valueProject(deferOnly({ ...c, tree }), { extras: false }).value;
      expectClose(engine, quote('call', c, tree), { rel: 1e-9, abs: 1e-11 }, { tree, ...c });
    }
  });
});

describe('on the CRR tree', () => {
  it('abandon and defer agree with quantlib.js within a tolerance that shrinks with Δt', () => {
    for (const c of grid) {
      const abs = 0.02 * c.strike * (c.horizon / c.steps);
      const put = valueProject(abandonOnly({ ...c, tree: 'crr' }), { extras: false }).value - c.value;
      expectClose(put, quote('put', c, 'crr'), { abs }, { kind: 'put', ...c });
      const call = valueProject(deferOnly({ ...c, tree: 'crr' }), { extras: false }).value;
      expectClose(call, quote('call', c, 'crr'), { abs }, { kind: 'call', ...c });
    }
  });
});
