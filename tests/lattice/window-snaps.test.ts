/**
 * Which steps a window opens (docs/engine.md §2): an American window keeps the steps inside it
 * (its start snaps up, its end down), a single date snaps to the nearest step, and every snap is
 * reported. A lattice that rounded a window's end outward used rights on dates their windows do
 * not allow (the demo plant's sale at 7.04 at 100 steps, for a window to year 7). Keeping a
 * right inside its window is common practice, no source; the checks are exact (step indices) or
 * rounding (1e-9 in years, 1e-12 relative in value).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { openSteps, valueProject, type ExerciseWindow, type ProjectModel, type Snap } from '@/lattice';

const openIndices = (mask: Uint8Array) => [...mask.keys()].filter((i) => mask[i] === 1);

describe('windows on the lattice', () => {
  it('an American window between steps opens only the steps inside it, and says where it moved', () => {
    const snaps: Snap[] = [];
    // Eight years in 100 steps: Δt = 0.08, so years 1 and 7 fall halfway between steps.
    const open = openIndices(openSteps({ kind: 'american', from: 1, to: 7 }, 0.08, 100, 'w', snaps));
    expect([open[0], open.at(-1), open.length]).toEqual([13, 87, 75]);
    expect(snaps.map((s) => [s.field, s.requested, Number(s.used.toFixed(9))])).toEqual([
      ['w.from', 1, 1.04],
      ['w.to', 7, 6.96],
    ]);
  });

  it('a window on the grid keeps its own ends, though t/Δt is not exact in floating point', () => {
    for (const [horizon, steps, from, to] of [
      // from/Δt and to/Δt come out as 9.000000000000002 and 2.9999999999999996.
      [3, 100, 0.27, 2.7],
      [7, 70, 0.1, 0.3],
      [8, 96, 2, 4],
    ] as const) {
      const dt = horizon / steps;
      const snaps: Snap[] = [];
      const open = openIndices(openSteps({ kind: 'american', from, to }, dt, steps, 'w', snaps));
      expect([open[0], open.at(-1)]).toEqual([Math.round(from / dt), Math.round(to / dt)]);
      expect(snaps).toEqual([]);
    }
  });

  it('every step a window opens lies inside it, unless none does: then the one nearest its middle', () => {
    fc.assert(
      fc.property(fc.integer({ min: 4, max: 400 }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (steps, a, b) => {
        const horizon = 5;
        const dt = horizon / steps;
        const [from, to] = [Math.min(a, b) * horizon, Math.max(a, b) * horizon];
        const open = openIndices(openSteps({ kind: 'american', from, to }, dt, steps, 'w', []));
        const inside = open.filter((i) => i * dt >= from - 1e-9 && i * dt <= to + 1e-9);
        if (Math.ceil(from / dt - 1e-9) <= Math.floor(to / dt + 1e-9)) {
          expect(inside).toEqual(open);
          // …and no step inside the window is left closed.
          expect(open.length).toBe(Math.floor(to / dt + 1e-9) - Math.ceil(from / dt - 1e-9) + 1);
        } else {
          expect(open).toEqual([Math.round((from + to) / 2 / dt)]);
        }
      }),
      { numRuns: 300, seed: 20261203 },
    );
  });

  it('single dates snap to the nearest step', () => {
    const dt = 0.08;
    const single = (w: ExerciseWindow) => openIndices(openSteps(w, dt, 100, 'w', []));
    expect(single({ kind: 'european', at: 3.03 })).toEqual([38]);
    expect(single({ kind: 'european', at: 3.05 })).toEqual([38]);
    expect(single({ kind: 'bermudan', dates: [0.97, 1.01, 2.5] })).toEqual([12, 13, 31]);
  });

  it('a right whose window falls between steps is worth what the steps inside it are worth', () => {
    // An abandonment put, eight years in 100 steps: the window [1, 7] values exactly as the
    // window of its inner steps [1.04, 6.96], and no more than one that truly reaches 7.04.
    const put = (window: ExerciseWindow): ProjectModel => ({
      underlying: { value: 100, volatility: 0.3, payoutYield: 0.08 },
      riskFreeRate: 0.04,
      horizon: 8,
      steps: 100,
      options: [{ kind: 'abandon', salvage: 90, window }],
    });
    const value = (w: ExerciseWindow) => valueProject(put(w), { extras: false }).expandedNpv;
    const asked = value({ kind: 'american', from: 1, to: 7 });
    expect(Math.abs(asked / value({ kind: 'american', from: 1.04, to: 6.96 }) - 1)).toBeLessThan(1e-12);
    expect(value({ kind: 'american', from: 1.04, to: 7.04 })).toBeGreaterThan(asked);
  });
});
