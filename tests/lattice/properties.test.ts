/**
 * Properties over several hundred random models (fast-check). Each is a fact of the trade
 * (common practice, no source) or an identity of the lattice; where a property holds exactly on
 * a fixed tree (costs and windows do not move the nodes) the tolerance is rounding only.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { explainNode, valueProject, type OptionTemplate, type ProjectModel, type TreeKind } from '@/lattice';

const tree = fc.constantFrom<TreeKind>('crr', 'jarrow-rudd', 'tian', 'trigeorgis');
const underlying = fc.record({
  value: fc.double({ min: 20, max: 500, noNaN: true }),
  volatility: fc.double({ min: 0.05, max: 0.8, noNaN: true }),
  payoutYield: fc.double({ min: 0, max: 0.08, noNaN: true }),
});
// Markets where every tree's no-arbitrage condition holds with room to spare: σ√Δt well above
// |r − δ|·Δt (models outside it are refused, which bad-input.test.ts checks).
const market = fc
  .record({
    underlying,
    riskFreeRate: fc.double({ min: 0, max: 0.08, noNaN: true }),
    horizon: fc.double({ min: 0.5, max: 6, noNaN: true }),
    steps: fc.integer({ min: 4, max: 60 }),
    tree,
  })
  .filter((m) => {
    const dt = m.horizon / m.steps;
    return m.underlying.volatility * Math.sqrt(dt) > 2 * Math.abs(m.riskFreeRate - m.underlying.payoutYield) * dt;
  });

function allNumbersFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allNumbersFinite);
  if (value && typeof value === 'object') return Object.entries(value).every(([k, v]) => k === 'errorEstimate' || allNumbersFinite(v));
  return true;
}

/** A random set of rights with windows inside the horizon. */
function rightsFor(horizon: number, V0: number) {
  const window = fc
    .tuple(fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }))
    .map(([a, b]) => ({ kind: 'american' as const, from: Math.min(a, b) * horizon, to: Math.max(a, b) * horizon }));
  const money = fc.double({ min: 0.1 * V0, max: 1.5 * V0, noNaN: true });
  const expand = fc.record({ kind: fc.constant('expand' as const), factor: fc.double({ min: 0.1, max: 1, noNaN: true }), cost: money, window });
  const contract = fc.record({ kind: fc.constant('contract' as const), fraction: fc.double({ min: 0.1, max: 0.6, noNaN: true }), savings: money, window });
  const abandon = fc.record({ kind: fc.constant('abandon' as const), salvage: money, window });
  const defer = fc.record({ kind: fc.constant('defer' as const), cost: money, window });
  return fc
    .tuple(
      fc.option(expand, { nil: undefined }),
      fc.option(contract, { nil: undefined }),
      fc.option(abandon, { nil: undefined }),
      fc.option(defer, { nil: undefined }),
    )
    .map((list) => list.filter((o): o is NonNullable<typeof o> => o !== undefined) as OptionTemplate[]);
}

const withRights = market.chain((m) => rightsFor(m.horizon, m.underlying.value).map((options) => ({ ...m, options }) as ProjectModel));

describe('lattice properties', () => {
  it('with no switches the value is exactly scale·V0 + PV(flows) + PV(terminal), on every tree', () => {
    fc.assert(
      fc.property(
        market,
        fc.double({ min: 0, max: 3, noNaN: true }),
        fc.double({ min: -20, max: 20, noNaN: true }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        (m, scale, flowPerYear, terminal) => {
          const model: ProjectModel = { ...m, modes: [{ id: 'only', scale, flowPerYear, terminal }] };
          const r = valueProject(model, { extras: false });
          const dt = m.horizon / m.steps;
          let pvFlows = 0;
          for (let i = 0; i < m.steps; i++) pvFlows += flowPerYear * dt * Math.exp(-m.riskFreeRate * i * dt);
          const expected = scale * m.underlying.value + pvFlows + terminal * Math.exp(-m.riskFreeRate * m.horizon);
          expect(Math.abs(r.value - expected)).toBeLessThanOrEqual(1e-10 * Math.max(1, Math.abs(expected)));
        },
      ),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 150) },
    );
  });

  it('expanded NPV is never below static NPV, and no NaN or Infinity leaves the engine', () => {
    // The static plan is valued in closed form; the rights are rolled back with the tree's p.
    // Jarrow–Rudd and Trigeorgis match E[V_{t+Δt}] = e^{(r−δ)Δt}V only approximately, so there
    // the comparison allows the tree's own first-moment error, summed over the steps.
    fc.assert(
      fc.property(withRights, (model) => {
        const r = valueProject(model, { extras: false });
        const { u, d, p, dt } = r.tree;
        const growth = Math.exp((model.riskFreeRate - (model.underlying.payoutYield ?? 0)) * dt);
        const momentError = Math.abs(p * u + (1 - p) * d - growth) / growth;
        const allowance = 1e-9 * Math.max(1, Math.abs(r.staticNpv)) + 2 * model.steps * momentError * model.underlying.value;
        expect(r.expandedNpv).toBeGreaterThanOrEqual(r.staticNpv - allowance);
        expect(allNumbersFinite(r)).toBe(true);
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 150) },
    );
  });

  it('value falls as an expand or defer cost rises and rises with salvage (same tree, so exactly)', () => {
    fc.assert(
      fc.property(withRights, fc.double({ min: 1.01, max: 2, noNaN: true }), (model, factor) => {
        const before = valueProject(model, { extras: false }).value;
        const dearer = structuredClone(model);
        for (const o of dearer.options ?? []) {
          if (o.kind === 'expand' || o.kind === 'defer') o.cost = (o.cost as number) * factor;
          if (o.kind === 'abandon') o.salvage = (o.salvage as number) / factor;
          if (o.kind === 'contract') o.savings = (o.savings as number) / factor;
        }
        const after = valueProject(dearer, { extras: false }).value;
        expect(after).toBeLessThanOrEqual(before + 1e-9 * Math.max(1, Math.abs(before)));
      }),
      { numRuns: 100 },
    );
  });

  it('value rises with volatility for a defer, expand or abandon right (σ raised by a half)', () => {
    // On a fixed step count the nodes move with σ, so a tiny change can wobble by the lattice
    // error; a 50 % rise in σ dominates it (checked at 200 steps on CRR).
    const single = fc.record({
      kind: fc.constantFrom('defer', 'expand', 'abandon'),
      V0: fc.double({ min: 50, max: 150, noNaN: true }),
      sigma: fc.double({ min: 0.1, max: 0.5, noNaN: true }),
    });
    fc.assert(
      fc.property(single, ({ kind, V0, sigma }) => {
        const window = { kind: 'american' as const, from: 0, to: 3 };
        const option: OptionTemplate =
          kind === 'defer'
            ? { kind: 'defer', cost: 100, window }
            : kind === 'expand'
              ? { kind: 'expand', factor: 0.5, cost: 50, window }
              : { kind: 'abandon', salvage: 90, window };
        const at = (volatility: number) =>
          valueProject({ underlying: { value: V0, volatility }, riskFreeRate: 0.04, horizon: 3, steps: 200, options: [option] }, { extras: false }).value;
        expect(at(sigma * 1.5)).toBeGreaterThanOrEqual(at(sigma) - 1e-9);
      }),
      { numRuns: 60 },
    );
  });

  it('American ≥ Bermudan ≥ European for nested windows (exactly, on the same tree)', () => {
    fc.assert(
      fc.property(market, fc.constantFrom('defer', 'abandon'), fc.double({ min: 0.6, max: 1.4, noNaN: true }), (m, kind, k) => {
        const strike = k * m.underlying.value;
        const T = m.horizon;
        const make = (
          window: OptionTemplate extends never
            ? never
            : { kind: 'american'; from: number; to: number } | { kind: 'bermudan'; dates: number[] } | { kind: 'european'; at: number },
        ): ProjectModel => ({
          ...m,
          options: [kind === 'defer' ? { kind: 'defer', cost: strike, window } : { kind: 'abandon', salvage: strike, window }],
        });
        const american = valueProject(make({ kind: 'american', from: 0, to: T }), { extras: false }).value;
        const bermudan = valueProject(make({ kind: 'bermudan', dates: [T / 3, (2 * T) / 3, T] }), { extras: false }).value;
        const european = valueProject(make({ kind: 'european', at: T }), { extras: false }).value;
        const eps = 1e-9 * m.underlying.value;
        expect(american).toBeGreaterThanOrEqual(bermudan - eps);
        expect(bermudan).toBeGreaterThanOrEqual(european - eps);
      }),
      { numRuns: 100 },
    );
  });

  it('European limits satisfy put–call parity C − P = V0·e^{−δT} − K·e^{−rT} on CRR and Tian', () => {
    fc.assert(
      fc.property(market, fc.constantFrom<TreeKind>('crr', 'tian'), fc.double({ min: 0.5, max: 1.5, noNaN: true }), (m, kind, k) => {
        const K = k * m.underlying.value;
        const window = { kind: 'european' as const, at: m.horizon };
        const base = { ...m, tree: kind };
        const call = valueProject({ ...base, options: [{ kind: 'defer', cost: K, window }] }, { extras: false }).value;
        const put = valueProject({ ...base, options: [{ kind: 'abandon', salvage: K, window }] }, { extras: false }).value - m.underlying.value;
        const parity = m.underlying.value * Math.exp(-m.underlying.payoutYield * m.horizon) - K * Math.exp(-m.riskFreeRate * m.horizon);
        expect(Math.abs(call - put - parity)).toBeLessThanOrEqual(1e-9 * m.underlying.value);
      }),
      { numRuns: 100 },
    );
  });

  it('on Jarrow–Rudd a vanishing volatility (1e-6) gives the deterministic answer', () => {
    fc.assert(
      fc.property(fc.double({ min: 50, max: 150, noNaN: true }), fc.double({ min: 0.01, max: 0.08, noNaN: true }), (V0, r) => {
        // No payout: a deterministic call is never exercised early, so it is worth V0 − K·e^{−rT}.
        const K = 100;
        const value = valueProject(
          {
            underlying: { value: V0, volatility: 1e-6 },
            riskFreeRate: r,
            horizon: 2,
            steps: 50,
            tree: 'jarrow-rudd',
            options: [{ kind: 'defer', cost: K, window: { kind: 'american', from: 0, to: 2 } }],
          },
          { extras: false },
        ).value;
        expect(Math.abs(value - Math.max(V0 - K * Math.exp(-r * 2), 0))).toBeLessThanOrEqual(1e-4);
      }),
      { numRuns: 60 },
    );
  });

  it('when two rights compete for the same downside (two abandon rights), each incremental value ≤ its stand-alone value', () => {
    // Checked case: two ways to close the project (different salvage and windows). Once one is
    // used the other is gone, so each adds less on top of the other than on its own. (Abandon
    // and contract are not such a case here: contracting first and abandoning later collects
    // both proceeds, so they can complement each other.)
    fc.assert(
      fc.property(market, fc.double({ min: 0.3, max: 0.9, noNaN: true }), fc.double({ min: 0.3, max: 0.9, noNaN: true }), (m, early, late) => {
        const V0 = m.underlying.value;
        const T = m.horizon;
        const r = valueProject({
          ...m,
          steps: Math.min(m.steps, 30),
          options: [
            { kind: 'abandon', salvage: early * V0, window: { kind: 'american', from: 0, to: T / 2 } },
            { kind: 'abandon', salvage: late * V0, window: { kind: 'american', from: T / 4, to: T } },
          ],
        });
        for (const sw of r.rights) expect(sw.incremental!).toBeLessThanOrEqual(sw.standalone! + 1e-9 * V0);
      }),
      { numRuns: 60 },
    );
  });
});

describe('the trimmed and the full rollback agree', () => {
  // A single right into a fixed mode is rolled by a trimmed loop that skips nodes it can prove
  // are exercised or zero (lattice/rollback.ts, trimmedSingle); explainNode always rolls every
  // node. Their root values must agree to rounding (1e-10 relative) — including for windows that
  // close and open, and for proceeds larger than the project.
  it('for a single defer, expand or abandon right with random windows', () => {
    const right = fc.record({
      kind: fc.constantFrom('defer', 'expand', 'abandon', 'contract'),
      money: fc.double({ min: 0.05, max: 2, noNaN: true }),
      a: fc.double({ min: 0, max: 1, noNaN: true }),
      b: fc.double({ min: 0, max: 1, noNaN: true }),
      bermudan: fc.boolean(),
    });
    fc.assert(
      fc.property(market, right, (m, { kind, money, a, b, bermudan }) => {
        const T = m.horizon;
        const window = bermudan
          ? { kind: 'bermudan' as const, dates: [Math.min(a, b) * T, ((a + b) / 2) * T, Math.max(a, b) * T] }
          : { kind: 'american' as const, from: Math.min(a, b) * T, to: Math.max(a, b) * T };
        const amount = money * m.underlying.value;
        const option: OptionTemplate =
          kind === 'defer'
            ? { kind: 'defer', cost: amount, window }
            : kind === 'expand'
              ? { kind: 'expand', factor: 0.5, cost: amount, window }
              : kind === 'abandon'
                ? { kind: 'abandon', salvage: amount, window }
                : { kind: 'contract', fraction: 0.4, savings: amount, window };
        const model: ProjectModel = { ...m, options: [option] };
        const trimmed = valueProject(model, { extras: false });
        const start = kind === 'defer' ? 'waiting' : 'operating';
        const full = explainNode(model, { step: 0, node: 0, mode: start }).value;
        expect(Math.abs(trimmed.value - full)).toBeLessThanOrEqual(1e-10 * Math.max(1, Math.abs(full)));
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 300) },
    );
  });
});
