/**
 * The engine's published-value checks as one table: each names its source, the printed figure,
 * the tolerance that the printed digits (or the source's own grid) allow, the model that
 * reproduces it and which figure of the result to read. The tests (crr-textbook,
 * published-values) assert every row; `scripts/reference-results.ts` values the same rows at
 * build time for the validation report, so the report's figures are never typed by hand.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { ProjectModel, ValuationResult } from '@/lattice';
import { abandonOnly, deferOnly } from '../support/models';

export interface PublishedCheck {
  source: string;
  what: string;
  published: number;
  /** Absolute tolerance, from the printed digits or the source's own error. */
  tolerance: number;
  model: ProjectModel;
  read: (result: ValuationResult) => number;
}

const lsCsv = readFileSync(fileURLToPath(new URL('./longstaff-schwartz-2001-table1.csv', import.meta.url)), 'utf8');

/** Longstaff & Schwartz (2001), Table 1: S, σ, T, finite-difference American, closed-form European. */
export const longstaffSchwartzRows = lsCsv
  .split('\n')
  .filter((line) => line.trim() !== '' && !line.startsWith('#') && !line.startsWith('S,'))
  .map((line) => {
    const [S, sigma, T, fd, european] = line.split(',').map(Number) as [number, number, number, number, number];
    return { S, sigma, T, fd, european };
  });

/** Hull, Example 21.1: an American put, S0 = K = 50, r = 0.10, σ = 0.40, T = 5/12, by steps. */
const hullRows: [steps: number, printed: number, tolerance: number][] = [
  [5, 4.49, 0.005],
  [30, 4.263, 0.0005],
  [50, 4.272, 0.0005],
  [100, 4.278, 0.0005],
  [500, 4.283, 0.0005],
];

const hull = hullRows.map(([steps, published, tolerance]): PublishedCheck => ({
  source: 'Hull, Options, Futures, and Other Derivatives, Example 21.1',
  what: `American put, S0 = K = 50, r = 10 %, σ = 40 %, 5 months, ${steps} steps`,
  published,
  tolerance,
  model: abandonOnly({ value: 50, strike: 50, rate: 0.1, volatility: 0.4, horizon: 5 / 12, steps }),
  read: (r) => r.value - 50,
}));

const mcdonaldCase = { value: 150, strike: 100, rate: Math.log(1.07), payoutYield: Math.log(1.12), volatility: 0.5, horizon: 2, steps: 2 };
const mcdonald: PublishedCheck[] = [
  {
    source: 'McDonald, Derivatives Markets, ch. 17',
    what: 'Option to defer with leakage, two annual steps: value',
    published: 55.8,
    tolerance: 0.005,
    model: deferOnly(mcdonaldCase),
    read: (r) => r.value,
  },
  {
    source: 'McDonald, Derivatives Markets, ch. 17',
    what: 'Option to defer with leakage, two annual steps: risk-neutral probability p*',
    published: 0.335,
    tolerance: 0.0005,
    model: deferOnly(mcdonaldCase),
    read: (r) => r.tree.p,
  },
];

/**
 * Their exercise is effectively discrete: a Bermudan window of 50 dates a year on a 500-steps-a-
 * year tree. Tolerance 0.005: three printed decimals and the finite-difference grid's own error.
 * Their closed-form European at 1000 steps a year, tolerance 0.005 (the CRR European error there).
 */
const longstaffSchwartz = longstaffSchwartzRows.flatMap(({ S, sigma, T, fd, european }): PublishedCheck[] => {
  const common = { underlying: { value: S, volatility: sigma }, riskFreeRate: 0.06, horizon: T };
  const dates = Array.from({ length: 50 * T }, (_, k) => (k + 1) / 50);
  const source = 'Longstaff & Schwartz (2001), Review of Financial Studies 14(1), Table 1';
  return [
    {
      source,
      what: `American put, S = ${S}, K = 40, σ = ${sigma}, T = ${T}, r = 6 %`,
      published: fd,
      tolerance: 0.005,
      model: { ...common, steps: 500 * T, options: [{ kind: 'abandon', salvage: 40, window: { kind: 'bermudan', dates: [0, ...dates] } }] },
      read: (r) => r.value - S,
    },
    {
      source,
      what: `European put, S = ${S}, K = 40, σ = ${sigma}, T = ${T}, r = 6 %`,
      published: european,
      tolerance: 0.005,
      model: { ...common, steps: 1000 * T, options: [{ kind: 'abandon', salvage: 40, window: { kind: 'european', at: T } }] },
      read: (r) => r.value - S,
    },
  ];
});

export const publishedChecks: PublishedCheck[] = [...hull, ...mcdonald, ...longstaffSchwartz];
