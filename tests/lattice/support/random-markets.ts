/**
 * Random inputs for the property tests (fast-check): markets on whole-year horizons with a
 * yearly payout share, and exercise windows on quarter-year dates. Only markets where every
 * tree's no-arbitrage condition holds with room to spare are drawn (σ√Δt well above
 * |r − δ|·Δt); models outside it are refused, which bad-input.test.ts checks.
 */
import fc from 'fast-check';
import type { ProjectModel } from '@/lattice';

export const market = fc
  .record({
    value: fc.double({ min: 20, max: 300, noNaN: true }),
    volatility: fc.double({ min: 0.1, max: 0.7, noNaN: true }),
    payoutYield: fc.double({ min: 0, max: 0.08, noNaN: true }),
    riskFreeRate: fc.double({ min: 0, max: 0.06, noNaN: true }),
    horizon: fc.integer({ min: 1, max: 6 }),
    perYear: fc.integer({ min: 2, max: 12 }),
    leak: fc.double({ min: 0, max: 0.3, noNaN: true }),
  })
  .filter((m) => m.volatility * Math.sqrt(1 / m.perYear) > (2 * Math.abs(m.riskFreeRate - m.payoutYield)) / m.perYear);

export type Market = typeof market extends fc.Arbitrary<infer M> ? M : never;

/** Windows on quarter-year dates inside the horizon, as American, Bermudan or European. */
export function windowIn(horizon: number) {
  const t = fc.integer({ min: 0, max: horizon * 4 }).map((q) => q / 4);
  return fc.oneof(
    fc.tuple(t, t).map(([a, b]) => ({ kind: 'american' as const, from: Math.min(a, b), to: Math.max(a, b) })),
    fc.uniqueArray(t, { minLength: 1, maxLength: 4 }).map((dates) => ({ kind: 'bermudan' as const, dates: dates.sort((a, b) => a - b) })),
    t.map((at) => ({ kind: 'european' as const, at })),
  );
}

/** The project of a market: its value, volatility, yield and a yearly payout share. */
export function underlyingOf(m: Market): ProjectModel['underlying'] {
  return {
    value: m.value,
    volatility: m.volatility,
    payoutYield: m.payoutYield,
    payoutPeriods: Array.from({ length: m.horizon }, (_, y) => ({ from: y, to: y + 1, fraction: m.leak })),
  };
}
