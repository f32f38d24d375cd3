/**
 * Bad input (docs/engine.md §8): every invalid model is refused before any work, with a message that
 * names the field and the rule, through `valueProject` and through the CLI (exit status 2, one
 * line on standard error). Each case has its own message.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { ModelError, valueProject } from '@/lattice';
import { assertFinite, nonFinitePath } from '@/lattice/finite';

const root = fileURLToPath(new URL('../..', import.meta.url));
const ok = {
  underlying: { value: 100, volatility: 0.3 },
  riskFreeRate: 0.05,
  horizon: 3,
  steps: 30,
};
const american = { kind: 'american', from: 0, to: 3 };
const modes = [
  { id: 'on', scale: 1 },
  { id: 'off', scale: 0 },
];

const cases: [string, unknown, string][] = [
  ['negative volatility', { ...ok, underlying: { value: 100, volatility: -0.2 } }, 'underlying.volatility must be > 0, got -0.2'],
  ['zero volatility', { ...ok, underlying: { value: 100, volatility: 0 } }, 'underlying.volatility must be > 0, got 0'],
  ['NaN value', { ...ok, underlying: { value: NaN, volatility: 0.3 } }, 'underlying.value must be a number, got NaN'],
  ['zero steps', { ...ok, steps: 0 }, 'steps must be ≥ 1, got 0'],
  ['too many steps', { ...ok, steps: 10_001 }, 'steps must be ≤ 10000, got 10001'],
  ['fractional steps', { ...ok, steps: 12.5 }, 'steps must be a whole number, got 12.5'],
  ['unknown tree', { ...ok, tree: 'leisen' }, 'tree must be one of "crr", "jarrow-rudd", "tian", "trigeorgis", got "leisen"'],
  ['negative horizon', { ...ok, horizon: -1 }, 'horizon must be > 0, got -1'],
  ['missing risk-free rate', { underlying: ok.underlying, horizon: 3, steps: 30 }, 'riskFreeRate is required'],
  ['unknown field', { ...ok, volatility: 0.3 }, 'model has unknown field(s) volatility'],
  [
    'unknown kind of right',
    { ...ok, options: [{ kind: 'grow', window: american }] },
    'options[0].kind must be one of "expand", "contract", "abandon", "defer", "stage", "mothball", got "grow"',
  ],
  [
    'cost of the wrong kind',
    { ...ok, options: [{ kind: 'expand', factor: 0.5, cost: 'lots', window: american }] },
    'options[0].cost must be a number, {amount, growth} or a schedule',
  ],
  [
    'window past the horizon',
    { ...ok, options: [{ kind: 'abandon', salvage: 50, window: { kind: 'american', from: 0, to: 4 } }] },
    'options[0].window must lie inside the horizon (0 to 3 years), ends at 4',
  ],
  [
    'window backwards',
    { ...ok, options: [{ kind: 'abandon', salvage: 50, window: { kind: 'american', from: 2, to: 1 } }] },
    'options[0].window.from must be ≤ options[0].window.to, got 2 > 1',
  ],
  [
    'unknown window kind',
    { ...ok, options: [{ kind: 'abandon', salvage: 50, window: { kind: 'asian', at: 1 } }] },
    'options[0].window.kind must be one of "american", "bermudan", "european", got "asian"',
  ],
  [
    'cost schedule out of order',
    {
      ...ok,
      options: [
        {
          kind: 'expand',
          factor: 0.5,
          cost: [
            { from: 2, amount: 40 },
            { from: 1, amount: 30 },
          ],
          window: american,
        },
      ],
    },
    'options[0].cost[1].from must be later than options[0].cost[0].from',
  ],
  [
    'unknown mode in a switch',
    { ...ok, modes, switches: [{ id: 'close', from: ['on'], to: 'gone', cost: 0, window: american }] },
    'switches[0].to names mode "gone", which is not in modes',
  ],
  ['unknown start mode', { ...ok, modes, start: 'idle' }, 'start names mode "idle", which is not in modes'],
  ['duplicate mode id', { ...ok, modes: [modes[0], modes[0]] }, 'modes[1].id must be unique, "on" appears twice'],
  [
    'switch into its own mode',
    { ...ok, modes, switches: [{ id: 'loop', from: ['on'], to: 'on', cost: 1, window: american }] },
    'switches[0].from[0] must differ from to ("on")',
  ],
  [
    'a cycle of switches that pays for itself',
    {
      ...ok,
      modes,
      switches: [
        { id: 'stop', from: ['on'], to: 'off', cost: -10, window: american },
        { id: 'restart', from: ['off'], to: 'on', cost: 5, window: american },
      ],
    },
    'is part of a cycle of switches whose costs sum to less than zero',
  ],
  [
    'p outside (0, 1)',
    { ...ok, underlying: { value: 100, volatility: 0.01 }, riskFreeRate: 0.2, steps: 3 },
    'steps gives a crr tree with risk-neutral probability p = ',
  ],
  [
    'defer with a separate investment',
    { ...ok, investment: 80, options: [{ kind: 'defer', cost: 80, window: american }] },
    'investment must be omitted when a defer or stage right carries the outlay',
  ],
  [
    'stage payments out of order',
    {
      ...ok,
      options: [
        {
          kind: 'stage',
          payments: [
            { at: 2, amount: 10 },
            { at: 1, amount: 10 },
          ],
        },
      ],
    },
    'options[0].payments[1].at must be later than the payment before it, got 1 after 2',
  ],
  [
    'payout at or above 100 %',
    { ...ok, underlying: { value: 100, volatility: 0.3, payouts: [{ at: 1, fraction: 1 }] } },
    'underlying.payouts[0].fraction must be < 1, got 1',
  ],
  [
    'options and modes together',
    { ...ok, modes, options: [{ kind: 'abandon', salvage: 50, window: american }] },
    'options cannot be combined with modes and switches',
  ],
  [
    'contract of more than everything',
    { ...ok, options: [{ kind: 'contract', fraction: 1.5, savings: 10, window: american }] },
    'options[0].fraction must be ≤ 1, got 1.5',
  ],
  [
    'duplicate option id',
    {
      ...ok,
      options: [
        { kind: 'abandon', id: 'exit', salvage: 50, window: american },
        { kind: 'expand', id: 'exit', factor: 1, cost: 9, window: american },
      ],
    },
    'options[1].id must be unique, "exit" is used twice',
  ],
  [
    'a lattice too wide to compute',
    { ...ok, underlying: { value: 100, volatility: 50 }, horizon: 100, steps: 10_000 },
    'underlying.volatility with this horizon and step count spreads the lattice',
  ],
];

describe('bad input is refused with its own message', () => {
  it('every case has a distinct message', () => {
    expect(new Set(cases.map(([, , message]) => message)).size).toBe(cases.length);
    expect(cases.length).toBeGreaterThanOrEqual(20);
  });

  it.each(cases)('through valueProject: %s', (_, model, message) => {
    let caught: unknown;
    try {
      valueProject(model);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(ModelError);
    expect((caught as ModelError).message).toContain(message);
  });

  it('through the CLI: exit status 2 and one line naming the field', () => {
    // NaN cannot travel in JSON; that case is covered through valueProject above.
    for (const [name, model, message] of cases.filter(([name]) => name !== 'NaN value')) {
      const run = spawnSync(process.execPath, ['--import', 'tsx', 'lattice/cli.ts', '-'], { cwd: root, input: JSON.stringify(model), encoding: 'utf8' });
      expect({ name, status: run.status }).toEqual({ name, status: 2 });
      const lines = run.stderr.trim().split('\n');
      expect({ name, lines: lines.length }).toEqual({ name, lines: 1 });
      expect(lines[0]).toContain(message);
      expect(run.stdout).toBe('');
    }
  }, 120_000);

  it('through the CLI: a valid model prints the result as JSON', () => {
    const model = { ...ok, options: [{ kind: 'abandon', salvage: 60, window: american }] };
    const run = spawnSync(process.execPath, ['--import', 'tsx', 'lattice/cli.ts', '-'], { cwd: root, input: JSON.stringify(model), encoding: 'utf8' });
    expect(run.status).toBe(0);
    const result = JSON.parse(run.stdout);
    expect(result.value).toBeCloseTo(valueProject(model).value, 12);
  });
});

describe('the work of a whole valuation is priced before any is done (docs/engine.md §8)', () => {
  // The review's case: twelve rights at 10,000 steps with every extra ran 193 s on one worker.
  const twelve = {
    underlying: { value: 100, volatility: 0.3 },
    riskFreeRate: 0.03,
    horizon: 10,
    steps: 10_000,
    investment: 80,
    options: Array.from({ length: 12 }, (_, k) => ({
      kind: 'abandon' as const,
      id: `sale ${k + 1}`,
      salvage: 40 + k,
      window: { kind: 'american' as const, from: k / 2, to: 10 },
    })),
  };

  it('refuses twelve rights at 10,000 steps with extras, naming the figure and the budget, at once', () => {
    const started = performance.now();
    const refusal = (() => {
      try {
        valueProject(twelve);
      } catch (error) {
        return error as ModelError;
      }
    })();
    expect(refusal?.issues[0]?.field).toBe('steps');
    expect(refusal?.issues[0]?.message).toMatch(/would visit 2\.\d+e\+9 node × mode cells, over the budget of 6\.00e\+8/);
    expect(performance.now() - started).toBeLessThan(1_000);
  });

  it('values a four-right model at 500 steps with every extra', () => {
    const r = valueProject({
      ...ok,
      steps: 500,
      options: [
        { kind: 'expand', factor: 0.5, cost: 40, window: american },
        { kind: 'contract', fraction: 0.3, savings: 25, window: american },
        { kind: 'abandon', salvage: 50, window: american },
        { kind: 'mothball', toScale: 0, cost: 2, backCost: 4 },
      ],
    });
    expect(r.sensitivities).not.toBeNull();
  });
});

describe('no NaN or Infinity leaves the engine (docs/engine.md §8)', () => {
  // Inputs are checked first, so a real result never trips this last check; it is checked here on
  // shapes like a result's, one bad number each.
  const result = (critical: number, errorEstimate: number) => ({
    value: 1,
    convergence: { points: [{ steps: 10, expandedNpv: 2 }], errorEstimate },
    rights: [
      { id: 'a', boundary: [] },
      {
        id: 'b',
        boundary: [
          { t: 0.5, critical: 3, low: null },
          { t: 1, critical, low: null },
        ],
      },
    ],
  });

  it('names the path of the first bad number', () => {
    expect(nonFinitePath(result(4, 0.1), '')).toBeNull();
    expect(nonFinitePath(result(Infinity, 0.1), '')).toBe('.rights[1].boundary[1].critical');
    expect(nonFinitePath(result(NaN, 0.1), '')).toBe('.rights[1].boundary[1].critical');
    expect(() => assertFinite(result(-Infinity, 0.1))).toThrow(
      'model produces a non-finite rights[1].boundary[1].critical; check the magnitudes of its inputs',
    );
    expect(() => assertFinite([1, [2, NaN]])).toThrow('non-finite [1][1];');
  });

  it('lets only the error estimate be NaN (no estimate), never infinite', () => {
    expect(nonFinitePath(result(4, NaN), '')).toBeNull();
    expect(nonFinitePath(result(4, Infinity), '')).toBe('.convergence.errorEstimate');
  });
});
