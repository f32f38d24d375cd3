/**
 * Where an approved right stands (lib/watch/status.ts): every status on hand-built boundaries,
 * and agreement with the lattice itself — at every node of the demo plant's approved lattice
 * where its expansion's window is open, the status is in_region exactly where the lattice uses
 * the right. Figures invented.
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type BoundaryPoint, type OptionTemplate, type RightResult } from '@/lattice';
import { demoPortfolio } from '@/demo/portfolio';
import { caseToModel } from '@/lib/case-model';
import { boundaryAt, rightStatuses } from '@/lib/watch/status';

const above = (t: number, critical: number): BoundaryPoint => ({ t, critical, side: 'above', low: critical, high: null });
const below = (t: number, critical: number): BoundaryPoint => ({ t, critical, side: 'below', low: null, high: critical });
const right = (id: string, boundary: BoundaryPoint[]) => ({ id, boundary }) as unknown as RightResult;

const options: OptionTemplate[] = [
  { kind: 'expand', id: 'Grow', factor: 0.5, cost: 40, window: { kind: 'american', from: 1, to: 4 } },
  { kind: 'abandon', id: 'Sell', salvage: 50, window: { kind: 'american', from: 0, to: 5 } },
  { kind: 'contract', id: 'Halve', fraction: 0.5, savings: 20, window: { kind: 'european', at: 2 } },
];
const rights = [
  right('Grow', [above(1, 150), above(1.05, 148), above(1.1, 146)]),
  right('Sell', [below(0.5, 45), below(0.55, 46)]),
  right('Halve', [below(2, 70)]),
];
const statusAt = (t: number, value: number) => rightStatuses({ options, rights, horizon: 5, volatility: 0.3, t, value });

describe('where each right stands', () => {
  it('reads the boundary between its steps, and nowhere the right is not used', () => {
    expect(boundaryAt(rights[0]!.boundary, 1.025)!.critical).toBeCloseTo(149, 12);
    expect(boundaryAt(rights[0]!.boundary, 1.2)).toBeNull();
    expect(boundaryAt(rights[0]!.boundary, 0.9)).toBeNull();
    // Less than a step before the first point (as the valuation date is before step 1): that point.
    expect(boundaryAt(rights[0]!.boundary, 0.98)!.critical).toBe(150);
    // Used at the valuation date's single node ("anywhere"): the next step's boundary stands for it;
    // at a later date "anywhere" means every node uses it, and is kept.
    const anywhere = { t: 0, side: 'anywhere' as const, critical: null, low: null, high: null };
    expect(boundaryAt([anywhere, above(0.1, 120)], 0)).toMatchObject({ critical: 120, side: 'above' });
    expect(boundaryAt([anywhere, above(0.3, 120)], 0)).toMatchObject({ critical: 120 });
    expect(boundaryAt([{ ...anywhere, t: 1 }, above(1.1, 120)], 1)).toMatchObject({ side: 'anywhere', critical: null });
  });

  it('says in_region, near and outside by the side and one standard deviation', () => {
    const [inside] = statusAt(1.025, 160);
    expect(inside).toMatchObject({ status: 'in_region', side: 'above' });
    expect(inside!.critical).toBeCloseTo(149, 12);
    const [near] = statusAt(1.025, 140);
    expect(near!.status).toBe('near');
    expect(near!.distanceSd).toBeCloseTo(Math.log(149 / 140) / 0.3, 12);
    expect(near!.distanceRatio).toBeCloseTo(149 / 140 - 1, 12);
    expect(statusAt(1.025, 80)[0]!.status).toBe('outside');
    expect(statusAt(0.5, 40)[1]!.status).toBe('in_region');
    expect(statusAt(0.5, 60)[1]!.status).toBe('near');
  });

  it('says when a window has not opened (with the boundary it will open on) or has closed', () => {
    const [grow, , halve] = statusAt(0.5, 100);
    expect(grow).toMatchObject({ status: 'window_not_open', windowOpensAt: 1, windowClosesAt: 4, critical: 150 });
    expect(halve).toMatchObject({ status: 'window_not_open', windowOpensAt: 2, critical: 70 });
    expect(statusAt(2, 60)[2]!.status).toBe('in_region');
    expect(statusAt(2.5, 60)[2]!.status).toBe('window_closed');
    expect(statusAt(4.5, 200)[0]!.status).toBe('window_closed');
  });

  it("agrees with the approved lattice's own decisions at every node where the expansion can be used", () => {
    const plant = demoPortfolio.find((p) => p.name === 'Phased bio-resin plant')!.cases[0]!;
    const { model } = caseToModel(plant);
    const result = valueProject(model, { extras: false, grid: true });
    const k = model.options!.findIndex((o) => o.kind === 'expand');
    const id = result.rights[k]!.id;
    let checked = 0;
    for (const step of result.grid!.steps) {
      const decisions = step.modes[result.startMode]!.decision;
      step.underlying.forEach((v, j) => {
        const watch = rightStatuses({
          options: model.options!,
          rights: result.rights,
          horizon: model.horizon,
          volatility: model.underlying.volatility,
          t: step.t,
          value: v,
        })[k]!;
        if (watch.status === 'window_not_open' || watch.status === 'window_closed') return;
        expect(watch.status === 'in_region', `t ${step.t}, node ${j}`).toBe(decisions[j] === id);
        checked++;
      });
    }
    expect(checked).toBeGreaterThan(100);
  });
});
