/**
 * The clock of a followed decision (lib/watch/clock.ts), checked against the lattice itself: the
 * rights still open at date t, valued by the model `modelAt` builds with V = a node's value, are
 * worth what the original lattice holds at that node (same step length, so the same tree from
 * there on). Growing costs, step schedules, American, Bermudan and European windows and payout
 * periods running across t are all in the model. Plus the fresh model written out by hand, and
 * the refusals. Figures invented.
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type ProjectModel } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { caseToModel } from '@/lib/case-model';
import { ClockError, costFrom, modelAt, windowFrom } from '@/lib/watch/clock';

const model: ProjectModel = {
  underlying: {
    value: 100,
    volatility: 0.3,
    payoutPeriods: [0, 1, 2, 3, 4].map((y) => ({ from: y, to: y + 1, fraction: 0.07 })),
  },
  riskFreeRate: 0.04,
  horizon: 5,
  steps: 100,
  investment: 80,
  options: [
    { kind: 'expand', id: 'Second line', factor: 0.5, cost: { amount: 40, growth: 0.03 }, window: { kind: 'american', from: 1, to: 4 } },
    {
      kind: 'abandon',
      id: 'Sell',
      salvage: [
        { from: 0, amount: 60 },
        { from: 2, amount: 50 },
        { from: 4, amount: 35 },
      ],
      window: { kind: 'american', from: 0, to: 5 },
    },
    { kind: 'contract', id: 'Halve', fraction: 0.5, savings: 30, window: { kind: 'bermudan', dates: [1, 2, 3] } },
    { kind: 'expand', id: 'Early add-on', factor: 0.2, cost: 10, window: { kind: 'european', at: 1 } },
  ],
};

describe('the clock of a followed decision', () => {
  it("values the rights still open at t as the original lattice does at that date's nodes", () => {
    const grid = valueProject(model, { extras: false, grid: true });
    const start = grid.startMode;
    for (const step of [30, 41, 60]) {
      const at = grid.grid!.steps[step]!;
      for (const j of [0, Math.floor(step / 3), Math.floor(step / 2), step]) {
        const v = at.underlying[j]!;
        const { model: later } = modelAt(model, at.t, v);
        const fresh = valueProject(later, { extras: false });
        const expected = at.modes[start]!.value[j]!;
        expect(Math.abs(fresh.value - expected) / Math.max(1, Math.abs(expected)), `step ${step}, node ${j}`).toBeLessThan(1e-9);
      }
    }
  });

  it('does the same for every demo case whose rights are all still open at mid-horizon (stages move the mode on their own dates)', () => {
    const checked: string[] = [];
    for (const project of demoPortfolio)
      for (const c of project.cases) {
        const { model: m } = caseToModel(c);
        if ((m.options ?? []).some((o) => o.kind === 'stage')) continue;
        const grid = valueProject(m, { extras: false, grid: true });
        const step = Math.floor(m.steps / 2);
        const at = grid.grid!.steps[step]!;
        const j = Math.floor(step / 2);
        const deferLapsed = (m.options ?? []).some((o) => o.kind === 'defer' && windowFrom(o.window, at.t) === null);
        if (deferLapsed) continue; // refused by the clock: a right to invest that lapsed leaves nothing to follow
        const fresh = valueProject(modelAt(m, at.t, at.underlying[j]!).model, { extras: false });
        const expected = at.modes[grid.startMode]!.value[j]!;
        expect(Math.abs(fresh.value - expected) / Math.max(1, Math.abs(expected)), `${project.name}, ${c.name}`).toBeLessThan(1e-9);
        checked.push(`${project.name}, ${c.name}`);
      }
    expect(checked.length).toBeGreaterThanOrEqual(3);
  });

  it('starts in the mode a recorded decision made: the value is the approved lattice’s in that mode, and a declined right is gone', () => {
    const grid = valueProject(model, { extras: false, grid: true });
    for (const step of [36, 60]) {
      const at = grid.grid!.steps[step]!;
      for (const j of [0, Math.floor(step / 2), step]) {
        const v = at.underlying[j]!;
        for (const [used, mode] of [
          [['Second line'], 'operating+Second line'],
          [['Halve'], 'operating+Halve'],
          [['Second line', 'Halve'], 'operating+Second line+Halve'],
        ] as const) {
          const fresh = valueProject(modelAt(model, at.t, v, { exercised: [...used], declined: [] }).model, { extras: false });
          expect(fresh.startMode).toBe(mode);
          const expected = at.modes[mode]!.value[j]!;
          expect(Math.abs(fresh.value - expected) / Math.max(1, Math.abs(expected)), `step ${step}, node ${j}, ${mode}`).toBeLessThan(1e-9);
        }
        // Declining the sale: the same as a model that never had it.
        const declined = valueProject(modelAt(model, at.t, v, { exercised: [], declined: ['Sell'] }).model, { extras: false });
        const without = valueProject(modelAt({ ...model, options: model.options!.filter((o) => o.id !== 'Sell') }, at.t, v).model, { extras: false });
        expect(declined.value).toBe(without.value);
      }
    }
  });

  it('keeps a mothballed plant free to restart at any time when its switch has no window, and until the window closes when it has one', () => {
    const mothball = (window?: { kind: 'american'; from: number; to: number }) =>
      modelAt({ ...model, options: [{ kind: 'mothball', id: 'Mothball', toScale: 0, cost: 2, backCost: 3, ...(window ? { window } : {}) }] }, 2, 100, {
        exercised: ['Mothball'],
        declined: [],
      }).model.options![0]!;
    expect(mothball()).not.toHaveProperty('window');
    expect(mothball({ kind: 'american', from: 0, to: 4 })).toMatchObject({ window: { kind: 'american', from: 0, to: 2 } });
    // Its window passed: a single date at the horizon, where restarting earns nothing.
    expect(mothball({ kind: 'american', from: 0, to: 1 })).toMatchObject({ window: { kind: 'european', at: 3 } });
  });

  it('writes the same model as one built by hand for t = 1.5', () => {
    const { model: later, closed } = modelAt(model, 1.5, 130);
    expect(closed).toEqual(['Early add-on']);
    expect(later.horizon).toBe(3.5);
    expect(later.steps).toBe(70);
    expect(later.investment).toBe(0);
    expect(later.underlying.value).toBe(130);
    expect(later.underlying.payoutPeriods![0]!.from).toBe(0);
    expect(later.underlying.payoutPeriods![0]!.to).toBeCloseTo(0.5, 12);
    // Half of the year left at the same yield: 1 − 0.93^0.5.
    expect(later.underlying.payoutPeriods![0]!.fraction).toBeCloseTo(1 - Math.sqrt(0.93), 12);
    expect(later.underlying.payoutPeriods).toHaveLength(4);
    const [expand, sell, halve] = later.options!;
    expect(expand).toMatchObject({ window: { kind: 'american', from: 0, to: 2.5 } });
    expect((expand as { cost: { amount: number } }).cost.amount).toBeCloseTo(40 * Math.exp(0.03 * 1.5), 12);
    expect(sell).toMatchObject({
      salvage: [
        { from: 0, amount: 60 },
        { from: 0.5, amount: 50 },
        { from: 2.5, amount: 35 },
      ],
      window: { kind: 'american', from: 0, to: 3.5 },
    });
    expect(halve).toMatchObject({ window: { kind: 'bermudan', dates: [0.5, 1.5] } });
  });

  it('keeps a date equal to t open, and the model unchanged at t = 0 but for V', () => {
    expect(windowFrom({ kind: 'european', at: 2 }, 2)).toEqual({ kind: 'european', at: 0 });
    expect(windowFrom({ kind: 'american', from: 0, to: 1 }, 1.0000001)).toBeNull();
    expect(costFrom([{ from: 1, amount: 5 }], 0.5)).toEqual([{ from: 0.5, amount: 5 }]);
    const now = modelAt(model, 0, 100).model;
    expect(valueProject(now, { extras: false }).value).toBe(valueProject(model, { extras: false }).value);
  });

  it('refuses a date outside the horizon, a lapsed right to invest, and a value that is not positive', () => {
    expect(() => modelAt(model, 5, 100)).toThrow(ClockError);
    expect(() => modelAt(model, -0.1, 100)).toThrow(ClockError);
    expect(() => modelAt(model, 1, 0)).toThrow(ClockError);
    const deferred: ProjectModel = { ...model, investment: undefined, options: [{ kind: 'defer', cost: 80, window: { kind: 'american', from: 0, to: 2 } }] };
    expect(() => modelAt(deferred, 2.5, 100)).toThrow(/lapsed/);
    expect(modelAt(deferred, 1, 100).model.options![0]).toMatchObject({ window: { kind: 'american', from: 0, to: 1 } });
  });
});
