/**
 * Interaction cases worked by hand on small CRR trees (arithmetic in the comments; common
 * practice, no source). The tree is chosen so every number is simple: σ = ln 1.25 and Δt = 1
 * give u = 1.25, d = 0.8; r = ln 1.05 gives e^{rΔt} = 1.05 and p = (1.05 − 0.8)/(1.25 − 0.8) = 5/9.
 * From V0 = 100 the nodes are 125, 80 at t = 1 and 156.25, 100, 64 at t = 2.
 * Tolerance 1e-9: the hand figures are exact fractions rounded to 1e-6 only where printed.
 */
import { describe, expect, it } from 'vitest';
import { valueProject, type ProjectModel } from '@/lattice';
import { expectClose } from './support/check';

const base = {
  underlying: { value: 100, volatility: Math.log(1.25) },
  riskFreeRate: Math.log(1.05),
  tree: 'crr' as const,
};
const p = 5 / 9;
const q = 4 / 9;

describe('interacting rights worked by hand', () => {
  it('the tree is u = 1.25, d = 0.8, p = 5/9', () => {
    const r = valueProject({ ...base, horizon: 2, steps: 2 }, { extras: false });
    expectClose(r.tree.u, 1.25, { abs: 1e-12 }, {});
    expectClose(r.tree.d, 0.8, { abs: 1e-12 }, {});
    expectClose(r.tree.p, p, { abs: 1e-12 }, {});
  });

  it('expand (+50 % for 30) and abandon (for a fixed 70) on one project, two steps', () => {
    // The salvage is a fixed amount here (fixedSalvage: a buyer's price for the site whatever
    // was built), so an expanded plant sells for 70 too.
    // t = 2, operating: max(V, 1.5V − 30, 70) → 204.375 (expand), 120 (expand), 70 (abandon).
    //        expanded:  max(1.5V, 70)       → 234.375, 150, 96.
    // t = 1, operating at 125: C = (5/9·204.375 + 4/9·120)/1.05 = 166.875/1.05 = 158.928571;
    //        expanding is worth 1.5·125 − 30 = 157.5 and abandoning 70, so it continues.
    //        operating at 80: C = (5/9·120 + 4/9·70)/1.05 = 97.777778/1.05 = 93.121693;
    //        expanding 1.5·80 − 30 = 90, abandoning 70: continues.
    // t = 0: C = (5/9·158.928571 + 4/9·93.121693)/1.05 = 123.505781; expanding now 150 − 30 = 120.
    const model: ProjectModel = {
      ...base,
      horizon: 2,
      steps: 2,
      options: [
        { kind: 'expand', factor: 0.5, cost: 30, window: { kind: 'american', from: 0, to: 2 } },
        { kind: 'abandon', salvage: 70, fixedSalvage: true, window: { kind: 'american', from: 0, to: 2 } },
      ],
    };
    const r = valueProject(model, { extras: false });
    const t1up = (p * 204.375 + q * 120) / 1.05;
    const t1down = (p * 120 + q * 70) / 1.05;
    const root = (p * t1up + q * t1down) / 1.05;
    expectClose(t1up, 158.928571, { abs: 1e-6 }, { step: 'hand arithmetic' });
    expectClose(root, 123.505781, { abs: 1e-6 }, { step: 'hand arithmetic' });
    expectClose(r.value, root, { abs: 1e-9 }, { case: 'expand + abandon' });
    expectClose(r.staticNpv, 100, { abs: 1e-9 }, {});
    // Expand is taken at (2,2) and (2,1): probability p² + 2pq = 65/81; abandon at (2,0): q² = 16/81.
    const [expand, abandon] = r.rights;
    expectClose(expand!.exerciseProbability, 65 / 81, { abs: 1e-12 }, {});
    expectClose(abandon!.exerciseProbability, 16 / 81, { abs: 1e-12 }, {});
    // At t = 2 the plant is sold at the bottom node (64) and expanded at the next (100): the
    // choice changes where 1.5·V − 30 = 70, V = 66.67, which is exact because both choices are
    // linear in V there. Sold below it, from the bottom of the tree.
    const last = abandon!.boundary.at(-1)!;
    expect([last.t, last.side, last.low]).toEqual([2, 'below', null]);
    expectClose(last.critical!, 200 / 3, { abs: 1e-9 }, { boundary: 'abandon at t = 2' });
    expectClose(last.high!, 200 / 3, { abs: 1e-9 }, { boundary: 'abandon at t = 2' });
    // Before t = 2 the plant is never sold: no boundary point there.
    expect(abandon!.boundary.map((b) => b.t)).toEqual([2]);
  });

  it('defer (for 90, until year 1) and expand (+50 % for 30, in year 2 only), two steps', () => {
    // t = 2, operating: max(V, 1.5V − 30) → 204.375, 120, 66 (expansion always pays).
    // t = 1, operating: (5/9·204.375 + 4/9·120)/1.05 = 158.928571 at 125,
    //                   (5/9·120 + 4/9·66)/1.05 = 96/1.05 = 91.428571 at 80.
    //        waiting: investing gives 158.928571 − 90 = 68.928571 and 91.428571 − 90 = 1.428571;
    //        the window closes after t = 1, so waiting on is worth 0: invest at both nodes.
    // t = 0, waiting: (5/9·68.928571 + 4/9·1.428571)/1.05 = 37.074830;
    //        investing now: (5/9·158.928571 + 4/9·91.428571)/1.05 − 90 = 122.789116 − 90 = 32.789116.
    //        So wait. Expanded NPV = 37.074830; static NPV = 100 − 90 = 10.
    const model: ProjectModel = {
      ...base,
      horizon: 2,
      steps: 2,
      options: [
        { kind: 'defer', cost: 90, window: { kind: 'american', from: 0, to: 1 } },
        { kind: 'expand', factor: 0.5, cost: 30, window: { kind: 'european', at: 2 } },
      ],
    };
    const r = valueProject(model, { extras: false });
    expectClose(r.expandedNpv, 37.07483, { abs: 1e-6 }, { case: 'defer + expand' });
    expectClose(r.staticNpv, 10, { abs: 1e-9 }, {});
    expectClose(r.modes.operating!, 122.789116, { abs: 1e-6 }, {});
    const [defer, expand] = r.rights;
    expectClose(defer!.exerciseProbability, 1, { abs: 1e-12 }, {});
    expect(defer!.exerciseTiming).toEqual([{ t: 1, probability: expect.closeTo(1, 12) }]);
    expectClose(expand!.exerciseProbability, 1, { abs: 1e-12 }, {});
  });

  it('salvage follows the scale sold: contracting by half then selling never beats selling whole', () => {
    // One step (V = 125 or 80 at t = 1). Contract by 50 % for savings of 48 at t = 0; sell for
    // 90 at t = 1. The salvage is for the whole plant, so after contracting it is 0.5·90 = 45.
    // Operating at t = 1: max(V, 90) = 125, 90, worth (5/9·125 + 4/9·90)/1.05 = 104.232804.
    // Contracted at t = 1: max(0.5·V, 45) = 62.5, 45, worth 52.116402; contracting now gives
    // 48 + 52.116402 = 100.116402 < 104.232804, so the plant is kept whole.
    // With a fixed salvage the half plant would still fetch 90: 48 + 90/1.05 = 133.714286, a
    // plant sold twice (the old rule's contract + abandon interaction was positive for this reason).
    const options = (fixedSalvage: boolean): ProjectModel['options'] => [
      { kind: 'contract', fraction: 0.5, savings: 48, window: { kind: 'european', at: 0 } },
      { kind: 'abandon', salvage: 90, fixedSalvage, window: { kind: 'european', at: 1 } },
    ];
    const scaled = valueProject({ ...base, horizon: 1, steps: 1, options: options(false) }, { extras: false });
    expectClose(scaled.value, (p * 125 + q * 90) / 1.05, { abs: 1e-9 }, { case: 'salvage per scale' });
    expectClose(scaled.rights[0]!.exerciseProbability, 0, { abs: 1e-12 }, {});
    const fixed = valueProject({ ...base, horizon: 1, steps: 1, options: options(true) }, { extras: false });
    expectClose(fixed.value, 48 + 90 / 1.05, { abs: 1e-9 }, { case: 'fixed salvage' });
  });

  it('a salvage on a step schedule: 90 until year 2, then 60', () => {
    // t = 2: max(V, 60) → 156.25, 100, 64 (64 > 60: keep).
    // t = 1 (salvage 90): at 125, continuing (5/9·156.25 + 4/9·100)/1.05 = 125 beats 90;
    //        at 80, continuing (5/9·100 + 4/9·64)/1.05 = 80 loses to 90: sell.
    // t = 0: continuing (5/9·125 + 4/9·90)/1.05 = 104.232804 beats 90.
    const t1down = Math.max((p * 100 + q * 64) / 1.05, 90);
    const t1up = Math.max((p * 156.25 + q * 100) / 1.05, 90);
    const root = (p * t1up + q * t1down) / 1.05;
    expectClose(root, 104.232804, { abs: 1e-6 }, { step: 'hand arithmetic' });
    const r = valueProject(
      {
        ...base,
        horizon: 2,
        steps: 2,
        options: [
          {
            kind: 'abandon',
            salvage: [
              { from: 0, amount: 90 },
              { from: 2, amount: 60 },
            ],
            window: { kind: 'american', from: 0, to: 2 },
          },
        ],
      },
      { extras: false },
    );
    expectClose(r.value, root, { abs: 1e-9 }, { case: 'step schedule' });
    expect(r.rights[0]!.exerciseTiming).toEqual([{ t: 1, probability: expect.closeTo(q, 12) }]);
  });

  it('an expansion whose cost grows 10 % a year (30·1.1^t)', () => {
    // Costs 30, 33, 36.3 at t = 0, 1, 2. Expanded, the plant is worth 1.5·V for good.
    // t = 2: max(V, 1.5V − 36.3) → 198.075, 113.7, 64.
    // t = 1: at 125, continuing (5/9·198.075 + 4/9·113.7)/1.05 = 152.928571 < 1.5·125 − 33 = 154.5: expand;
    //        at 80, continuing (5/9·113.7 + 4/9·64)/1.05 = 87.248677 > 120 − 33 = 87: wait.
    // t = 0: continuing (5/9·154.5 + 4/9·87.248677)/1.05 = 118.676... < 150 − 30 = 120: expand now.
    const cost = (t: number) => 30 * 1.1 ** t;
    const t2 = [156.25, 100, 64].map((v) => Math.max(v, 1.5 * v - cost(2)));
    const t1up = Math.max((p * t2[0]! + q * t2[1]!) / 1.05, 1.5 * 125 - cost(1));
    const t1down = Math.max((p * t2[1]! + q * t2[2]!) / 1.05, 1.5 * 80 - cost(1));
    const root = Math.max((p * t1up + q * t1down) / 1.05, 150 - cost(0));
    expectClose(root, 120, { abs: 1e-9 }, { step: 'hand arithmetic' });
    const r = valueProject(
      {
        ...base,
        horizon: 2,
        steps: 2,
        options: [{ kind: 'expand', factor: 0.5, cost: { amount: 30, growth: Math.log(1.1) }, window: { kind: 'american', from: 0, to: 2 } }],
      },
      { extras: false },
    );
    expectClose(r.value, root, { abs: 1e-9 }, { case: 'growing cost' });
    expect(r.rights[0]!.exerciseTiming).toEqual([{ t: 0, probability: 1 }]);
  });

  it('mothball and restart around a discrete payout, two steps', () => {
    // The project pays 25 % of its value at t = 1. The payout belongs to the year that ends
    // there (docs/engine.md §4): the mode held during that year receives it, and a decision at
    // t = 1 sees the value after it: 93.75 and 60 at t = 1, so 117.1875, 75, 48 at t = 2.
    // Mothballing costs 2, earns savings of 8 a year (received at the start of the year, as
    // the mode's flows are) and forgoes the project's payouts; restarting costs 4. Operating
    // for good is worth exactly V0 = 100.
    // t = 2, mothballed: restart if V − 4 > 0 (at every node).
    // t = 1, mothballed: staying gives 8 + (p·(1.25·V − 4) + q·(0.8·V − 4))/1.05 = 8 + V − 4/1.05
    //        = 97.94 and 64.19 (V = 93.75, 60), better than restarting now (89.75, 56): stay.
    // t = 1, operating: mothballing gives those less 2 = 95.94, 62.19, better than continuing
    //        (93.75, 60): mothball, and the node also receives the payout (31.25, 20).
    //        So W = V_before_payout + 8 − 2 − 4/1.05 at both nodes.
    // t = 0, operating: continuing gives 100 + (8 − 2 − 4/1.05)/1.05 = 102.086168; mothballing
    //        now forgoes the year's payout: 8 + (p·97.94 + q·64.19)/1.05 − 2 = 84.99. So wait a
    //        year, then mothball (with the old lump-on-the-date rule it paid to mothball at
    //        t = 0 and collect the payout anyway: 102.190476).
    const model: ProjectModel = {
      underlying: { ...base.underlying, payouts: [{ at: 1, fraction: 0.25 }] },
      riskFreeRate: base.riskFreeRate,
      tree: 'crr',
      horizon: 2,
      steps: 2,
      options: [{ kind: 'mothball', toScale: 0, cost: 2, backCost: 4, flowPerYear: 8 }],
    };
    const r = valueProject(model, { extras: false });
    expectClose(r.value, 100 + (8 - 2 - 4 / 1.05) / 1.05, { abs: 1e-9 }, { case: 'mothball + restart' });
    expectClose(r.rights[0]!.exerciseProbability, 1, { abs: 1e-12 }, {});
    expect(r.rights[0]!.exerciseTiming).toEqual([{ t: 1, probability: expect.closeTo(1, 12) }]);
  });
});

describe('the node grid on request', () => {
  const model: ProjectModel = {
    ...base,
    horizon: 2,
    steps: 2,
    options: [
      { kind: 'expand', factor: 0.5, cost: 30, window: { kind: 'american', from: 0, to: 2 } },
      { kind: 'abandon', salvage: 70, fixedSalvage: true, window: { kind: 'american', from: 0, to: 2 } },
    ],
  };

  it('holds the hand-worked values and decisions of the expand + abandon case', () => {
    const grid = valueProject(model, { extras: false, grid: true }).grid!;
    const t2 = grid.steps[2]!;
    t2.underlying.forEach((v, j) => expectClose(v, [64, 100, 156.25][j]!, { abs: 1e-9 }, { j }));
    t2.modes.operating!.value.forEach((w, j) => expectClose(w, [70, 120, 204.375][j]!, { abs: 1e-9 }, { j }));
    expect(t2.modes.operating!.decision).toEqual(['abandon-1', 'expand-1', 'expand-1']);
    expect(grid.steps[1]!.modes.operating!.decision).toEqual([null, null]);
    expectClose(grid.steps[1]!.modes.operating!.value[1]!, 158.928571, { abs: 1e-6 }, {});
    expectClose(grid.steps[0]!.modes.operating!.value[0]!, 123.505781, { abs: 1e-6 }, {});
  });

  it('is refused beyond the node budget', () => {
    expect(() => valueProject({ ...model, steps: 1000, horizon: 2 }, { extras: false, grid: true })).toThrow('over the budget of 200000');
  });
});
