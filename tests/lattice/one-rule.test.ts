/**
 * One rollback rule (docs/engine.md §4), proven: every fast path of lattice/rollback.ts — the
 * fused single-switch rows, the trimmed rows that skip pure-exercise and zero regions, the
 * one-pass rows in targets-first order — gives what the reference schedule (every continuation
 * first, then the exercise rule) gives, over random multi-right models with American, Bermudan
 * and European windows, reversible switches and payout schedules: the same root value for every
 * mode, the same decision at every node, the same located boundaries and the same exercise
 * probabilities. Tolerance: rounding only (the same arithmetic in another order), 1e-11 of the
 * money; decisions must be identical.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { OptionTemplate, ProjectModel } from '@/lattice';
import { prepareModel } from '@/lattice/check-model';
import { exerciseProfiles } from '@/lattice/forward';
import { buildPlan } from '@/lattice/plan';
import { rollback } from '@/lattice/rollback';
import { market, underlyingOf, windowIn } from './support/random-markets';

const models = market.chain((mk) => {
  const money = fc.double({ min: 0.05 * mk.value, max: 1.3 * mk.value, noNaN: true });
  const window = windowIn(mk.horizon);
  const right = fc.oneof(
    fc.record({ kind: fc.constant('expand' as const), factor: fc.double({ min: 0.2, max: 1, noNaN: true }), cost: money, window }),
    fc.record({ kind: fc.constant('contract' as const), fraction: fc.double({ min: 0.2, max: 0.6, noNaN: true }), savings: money, window }),
    fc.record({ kind: fc.constant('abandon' as const), salvage: money, fixedSalvage: fc.boolean(), window }),
    fc.record({
      kind: fc.constant('mothball' as const),
      toScale: fc.constantFrom(0, 0.5),
      cost: money.map((x) => x / 20),
      backCost: money.map((x) => x / 10),
      flowPerYear: money.map((x) => x / 40),
    }),
  );
  const outlay = fc.option(fc.record({ kind: fc.constant('defer' as const), cost: money, window }), { nil: null });
  return fc.tuple(outlay, fc.array(right, { minLength: 1, maxLength: 3 })).map(([defer, rights]) => {
    const options = (defer ? [defer, ...rights] : rights) as OptionTemplate[];
    const model: ProjectModel = {
      underlying: underlyingOf(mk),
      riskFreeRate: mk.riskFreeRate,
      horizon: mk.horizon,
      steps: mk.horizon * mk.perYear,
      ...(defer ? {} : { investment: 0.8 * mk.value }),
      options,
    };
    return model;
  });
});

const close = (a: number, b: number, money: number) => (Number.isNaN(a) && Number.isNaN(b)) || a === b || Math.abs(a - b) <= 1e-11 * money;

describe('one rollback rule', () => {
  it('every fast path gives the reference rule’s values, decisions, boundaries and probabilities', () => {
    fc.assert(
      fc.property(models, (input) => {
        const { model, compiled } = prepareModel(input);
        const plan = buildPlan(model, compiled);
        const money = model.underlying.value * 4;
        const reference = rollback(plan, { decisions: true, reference: true });
        const fast = rollback(plan, { decisions: true });
        const valueOnly = rollback(plan, {});
        for (let m = 0; m < plan.modeCount; m++) {
          expect(close(fast.rootOption[m]!, reference.rootOption[m]!, money)).toBe(true);
          expect(close(valueOnly.rootOption[m]!, reference.rootOption[m]!, money)).toBe(true);
        }
        const width = plan.steps + 1;
        for (let m = 0; m < plan.modeCount; m++)
          for (let i = 0; i <= plan.steps; i++)
            for (let j = 0; j <= i; j++) {
              const row = m * width + i;
              if (fast.decisions!.at(row, j) !== reference.decisions!.at(row, j))
                expect({ m, i, j, fast: fast.decisions!.at(row, j) }).toEqual({ m, i, j, fast: reference.decisions!.at(row, j) });
            }
        for (let k = 0; k < reference.boundaryLow!.length; k++) {
          expect(close(fast.boundaryLow![k]!, reference.boundaryLow![k]!, money)).toBe(true);
          expect(close(fast.boundaryHigh![k]!, reference.boundaryHigh![k]!, money)).toBe(true);
        }
        const rightOf = Int32Array.from(compiled.switches, (s) => s.right);
        const a = exerciseProfiles(plan, fast.decisions!, rightOf, compiled.rights.length, compiled.start);
        const b = exerciseProfiles(plan, reference.decisions!, rightOf, compiled.rights.length, compiled.start);
        expect(a.map((p) => p.probability)).toEqual(b.map((p) => p.probability));
      }),
      { numRuns: Number(process.env.PROPERTY_RUNS ?? 200), seed: 20261202 },
    );
  });
});
