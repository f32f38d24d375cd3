/**
 * One baseline for every breakdown figure (docs/engine.md §4): the plan without a right is the
 * plan the static NPV describes, and a right can always be left unused, so no stand-alone or
 * incremental value is negative. The first breakdown built a project without its defer or stage
 * right "now", not when the static plan builds it: a defer whose window opens later came out at
 * −5.25 incremental, a stage with abandonment under leakage at −11.1, and an expansion's
 * stand-alone beside a late defer was inflated (21.0 for about 6.2).
 *
 * Salvage follows the scale it sells, so two puts on one plant substitute: contract + abandon
 * interact negatively (Trigeorgis 1993, JFQA 28(1), for the sign: from memory).
 *
 * Tolerance: each property holds exactly on a fixed lattice (the larger right set contains the
 * smaller one's strategies, node by node), so only rounding is allowed: 1e-9 of the money.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { valueProject, type OptionTemplate, type ProjectModel } from '@/lattice';
import { market, underlyingOf, windowIn } from './support/random-markets';

function modelFrom(m: typeof market) {
  return m.chain((mk) => {
    const money = fc.double({ min: 0.1 * mk.value, max: 1.2 * mk.value, noNaN: true });
    const window = windowIn(mk.horizon);
    const later = fc.double({ min: 0.25, max: 1, noNaN: true }).map((x) => Math.round(x * mk.horizon * 4) / 4);
    // The outlay: none, a defer whose window may open late, or stage payments.
    const outlay = fc.oneof(
      fc.constant(null),
      fc.record({ kind: fc.constant('defer' as const), cost: money, window: later.map((from) => ({ kind: 'american' as const, from, to: mk.horizon })) }),
      fc.record({
        kind: fc.constant('stage' as const),
        payments: fc.tuple(money, money, later).map(([a, b, at]) => [
          { at: 0, amount: a / 3 },
          { at, amount: b / 2 },
        ]),
      }),
    );
    const expand = fc.record({ kind: fc.constant('expand' as const), factor: fc.double({ min: 0.2, max: 1, noNaN: true }), cost: money, window });
    const contract = fc.record({ kind: fc.constant('contract' as const), fraction: fc.double({ min: 0.2, max: 0.6, noNaN: true }), savings: money, window });
    const abandon = fc.record({ kind: fc.constant('abandon' as const), salvage: money, window });
    const mothball = fc.record({
      kind: fc.constant('mothball' as const),
      toScale: fc.constant(0),
      cost: money.map((x) => x / 20),
      backCost: money.map((x) => x / 10),
    });
    return fc
      .tuple(
        outlay,
        fc.option(expand, { nil: null }),
        fc.option(contract, { nil: null }),
        fc.option(abandon, { nil: null }),
        fc.option(mothball, { nil: null }),
      )
      .map(([o, ...rest]) => {
        const options = [o, ...rest].filter((x) => x !== null) as OptionTemplate[];
        const model: ProjectModel = {
          underlying: underlyingOf(mk),
          riskFreeRate: mk.riskFreeRate,
          horizon: mk.horizon,
          steps: mk.horizon * mk.perYear,
          ...(o ? {} : { investment: 0.8 * mk.value }),
          options,
        };
        return model;
      })
      .filter((model) => (model.options ?? []).length >= 2);
  });
}

describe('one baseline: no right is worth less than nothing', () => {
  it('stand-alone and incremental values are never negative, over random multi-right models with late defer windows, stages and payouts', () => {
    fc.assert(
      fc.property(modelFrom(market), (model) => {
        const r = valueProject(model);
        const scale = model.underlying.value;
        for (const sw of r.rights) {
          expect({ id: sw.id, standalone: sw.standalone! >= -1e-9 * scale ? 'ok' : sw.standalone }).toEqual({ id: sw.id, standalone: 'ok' });
          expect({ id: sw.id, incremental: sw.incremental! >= -1e-9 * scale ? 'ok' : sw.incremental }).toEqual({ id: sw.id, incremental: 'ok' });
        }
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 150), seed: 20261202 },
    );
  });

  // The two shapes the review measured (invented figures, as in its report).
  it('a defer whose window opens in year 2 beside an expansion', () => {
    const r = valueProject({
      underlying: { value: 100, volatility: 0.3, payoutPeriods: [1, 2, 3, 4, 5].map((y) => ({ from: y - 1, to: y, fraction: 0.15 })) },
      riskFreeRate: 0.04,
      horizon: 5,
      steps: 100,
      options: [
        { kind: 'defer', cost: 90, window: { kind: 'american', from: 2, to: 5 } },
        { kind: 'expand', factor: 0.5, cost: 50, window: { kind: 'american', from: 1, to: 5 } },
      ],
    });
    for (const sw of r.rights) expect([sw.id, sw.standalone! >= 0, sw.incremental! >= 0]).toEqual([sw.id, true, true]);
  });

  it('a stage with abandonment under leakage', () => {
    const r = valueProject({
      underlying: { value: 100, volatility: 0.35, payoutYield: 0.06 },
      riskFreeRate: 0.03,
      horizon: 4,
      steps: 80,
      options: [
        {
          kind: 'stage',
          payments: [
            { at: 0, amount: 20 },
            { at: 2, amount: 60 },
          ],
        },
        { kind: 'abandon', salvage: 40, window: { kind: 'american', from: 0, to: 4 } },
      ],
    });
    for (const sw of r.rights) expect([sw.id, sw.standalone! >= 0, sw.incremental! >= 0]).toEqual([sw.id, true, true]);
  });
});

describe('salvage follows the scale sold', () => {
  it('contract + abandon on the demo plant substitute: their interaction is not positive', () => {
    // The demo plant's figures (invented): V0 ≈ 248, σ = 30 %, eight years, payouts spread.
    const model: ProjectModel = {
      underlying: {
        value: 248,
        volatility: 0.3,
        payoutPeriods: [1, 2, 3, 4, 5, 6, 7, 8]
          .map((y) => ({ from: y - 1, to: y, fraction: 1 / (9 - y) }))
          .map((p) => ({ ...p, fraction: Math.min(p.fraction, 0.999999) })),
      },
      riskFreeRate: 0.03,
      horizon: 8,
      steps: 96,
      investment: 185,
      options: [
        { kind: 'contract', fraction: 0.4, savings: 45, window: { kind: 'american', from: 1, to: 8 } },
        { kind: 'abandon', salvage: 95, window: { kind: 'american', from: 1, to: 8 } },
      ],
    };
    const r = valueProject(model);
    const [contract, abandon] = r.rights;
    // The engine reports it; it is the premium less the two stand-alone values.
    expect(r.interaction).toBeCloseTo(r.optionPremium - contract!.standalone! - abandon!.standalone!, 10);
    expect(r.interaction!).toBeLessThanOrEqual(1e-9 * 248);
  });
});
