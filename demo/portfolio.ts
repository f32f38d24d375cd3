/**
 * Kestrel Bay Materials' demo portfolio. Every project, figure and name here is invented for
 * the demo (amounts in EUR millions); none describes a real company or plant.
 *
 * Four projects, one per kind of flexibility the product values: a phased plant (expand and
 * abandon), a hub that may wait (defer with a cost that grows), a pilot line funded in stages,
 * and an older line that can be mothballed and restarted. Each has two cases.
 */
import type { DemoFollow } from './seed-follow';
import type { CashFlowYear } from '@/lib/cash-flows';
import type { CaseInput } from '@/lib/validations/case';

export interface DemoProject {
  name: string;
  description: string;
  cases: CaseInput[];
  /** Where a case stands in the review workflow once seeded (the others stay drafts). */
  reviews?: { caseIndex: number; outcome: 'approved' | 'in_review'; recommendation: string }[];
  /** The approved case followed since an approval in the past (demo/seed-follow.ts). */
  follow?: DemoFollow;
}

/** A yearly schedule from parallel columns (year 0 first), so the figures read like a spreadsheet. */
function schedule(columns: { revenue: number[]; operatingCost: number[]; capex: number[]; tax: number[]; workingCapital: number[] }): CashFlowYear[] {
  return columns.revenue.map((_, year) => ({
    year,
    revenue: columns.revenue[year]!,
    operatingCost: columns.operatingCost[year]!,
    capex: columns.capex[year]!,
    tax: columns.tax[year]!,
    workingCapital: columns.workingCapital[year]!,
  }));
}

const plantRows = schedule({
  revenue: [0, 58, 74, 86, 94, 98, 100, 101, 102],
  operatingCost: [0, 36, 44, 50, 54, 56, 57, 58, 58],
  capex: [165, 0, 0, 0, 0, 0, 0, 0, 0],
  tax: [0, 3.5, 6.5, 8, 9.5, 10, 10.5, 10.5, 11],
  workingCapital: [0, 6, 2, 1.5, 1, 0.5, 0, 0, -11],
});

const plantBase: CaseInput = {
  name: 'Base case',
  cashFlows: { rows: plantRows, wacc: 0.085, timing: 'end-of-year' },
  settings: {
    volatility: 0.3,
    riskFreeRate: 0.03,
    steps: 96,
    tree: 'crr',
    volatilitySource: {
      method: 'direct',
      note: 'Invented for the demo: the volatility of listed specialty-resin producers’ value over five years, unlevered.',
    },
  },
  options: [
    { kind: 'expand', id: 'Phase 2', factor: 0.5, cost: 95, window: { kind: 'american', from: 2, to: 4 } },
    {
      kind: 'abandon',
      id: 'Sell the plant',
      salvage: [
        { from: 0, amount: 95 },
        { from: 4, amount: 70 },
        { from: 6, amount: 35 },
      ],
      // Until year 7: selling at the end of the schedule, after its last cash flow, would be a
      // certain gain (a plan, not an option) the cash flows should hold instead.
      window: { kind: 'american', from: 1, to: 7 },
    },
  ],
};

const hubRows = schedule({
  revenue: [0, 30, 33, 35, 36, 37, 38, 38, 39, 39, 40],
  operatingCost: [0, 17, 18, 19, 19.5, 20, 20.5, 20.5, 21, 21, 21.5],
  capex: [92, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0],
  tax: [0, 2.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5, 3.5],
  workingCapital: [0, 2, 0.5, 0.5, 0, 0, 0, 0, 0, 0, -3],
});

const hubBase: CaseInput = {
  name: 'Base case',
  cashFlows: { rows: hubRows, wacc: 0.08, timing: 'end-of-year' },
  settings: {
    volatility: 0.28,
    riskFreeRate: 0.03,
    steps: 100,
    tree: 'crr',
    volatilitySource: { method: 'direct', note: 'Invented for the demo: regional cold-chain rents and volumes, five years of history.' },
  },
  options: [{ kind: 'defer', id: 'Build the hub', cost: { amount: 92, growth: 0.04 }, window: { kind: 'american', from: 0, to: 3 } }],
};

const pilotRows = schedule({
  revenue: [0, 0, 0, 32, 44, 52, 57, 60],
  operatingCost: [0, 0, 0, 17, 22, 25, 27, 28],
  capex: [10, 18, 32, 0, 0, 0, 0, 0],
  tax: [0, 0, 0, 1.5, 3, 4, 4.5, 5],
  workingCapital: [0, 0, 0, 2.5, 1, 0.5, 0, -4],
});

const pilotBase: CaseInput = {
  name: 'Base case',
  cashFlows: { rows: pilotRows, wacc: 0.095, timing: 'end-of-year' },
  settings: {
    volatility: 0.4,
    riskFreeRate: 0.03,
    steps: 84,
    tree: 'crr',
    volatilitySource: { method: 'direct', note: 'Invented for the demo: a new compound with no market yet; set high on purpose.' },
  },
  options: [
    {
      kind: 'stage',
      id: 'Pilot funding',
      payments: [
        { at: 0, amount: 10 },
        { at: 1, amount: 18 },
        { at: 2, amount: 32 },
      ],
    },
  ],
};

const lineRows = schedule({
  revenue: [0, 44, 42, 40, 38, 36, 34],
  operatingCost: [0, 35, 34.5, 34, 33.5, 33, 32.5],
  capex: [0, 1.5, 1.5, 1.5, 1.5, 1.5, 0],
  tax: [0, 2, 1.5, 1.2, 0.9, 0.6, 0.3],
  workingCapital: [0, 0, 0, 0, 0, 0, -2],
});

const lineBase: CaseInput = {
  name: 'Base case',
  cashFlows: { rows: lineRows, wacc: 0.09, timing: 'end-of-year' },
  settings: {
    volatility: 0.35,
    riskFreeRate: 0.03,
    steps: 72,
    tree: 'crr',
    volatilitySource: { method: 'direct', note: 'Invented for the demo: the line’s own margins over the last eight years.' },
  },
  options: [
    { kind: 'mothball', id: 'Mothball', toScale: 0, cost: 1.5, backCost: 3, flowPerYear: 2, window: { kind: 'american', from: 0, to: 6 } },
    { kind: 'abandon', id: 'Close the line', salvage: 6, window: { kind: 'american', from: 0, to: 5 } },
  ],
};

export const demoPortfolio: DemoProject[] = [
  {
    name: 'Phased bio-resin plant',
    description:
      'Phase 1 of a bio-resin plant now, with the right to add phase 2 in years 2–4 and to sell the plant for a salvage value that falls after year 4. Invented demo figures, EUR millions.',
    cases: [
      plantBase,
      {
        ...plantBase,
        name: 'Volatile demand',
        settings: {
          ...plantBase.settings,
          volatility: 0.42,
          volatilitySource: {
            method: 'direct',
            note: 'Invented for the demo: a stress case, the base case’s 30 % raised to 42 % for a demand that swings more.',
          },
        },
      },
    ],
    reviews: [
      {
        caseIndex: 0,
        outcome: 'approved',
        recommendation:
          'Approve phase 1 now. On its own the plan does not pay back (static NPV below zero), but the right to add phase 2 and the sale option carry it: commit to phase 2 only if the plant is worth more than the boundary in years 2–4, and sell if it falls below its boundary. (Invented demo text.)',
      },
    ],
    follow: {
      approvedDaysAgo: 800,
      observations: [
        { daysAgo: 700, ofApproved: 1.03, note: 'First full quarter: output on plan. (Invented demo figure.)', source: 'updated DCF' },
        { daysAgo: 520, ofApproved: 1.08, note: 'Two offtake contracts signed at higher prices. (Invented demo figure.)', source: 'updated DCF' },
        { daysAgo: 300, ofApproved: 1.12, note: 'Listed resin producers re-rated upwards. (Invented demo figure.)', source: 'market comparables' },
        { daysAgo: 120, ofApproved: 1.15, note: 'Demand ahead of plan for a third quarter. (Invented demo figure.)', source: 'updated DCF' },
      ],
      near: {
        right: 'Phase 2',
        daysAgo: 12,
        sd: -0.45,
        note: 'Phase 2 now open: indicative interest from a second offtaker; value per the updated DCF. (Invented demo figure.)',
        source: 'updated DCF',
      },
    },
  },
  {
    name: 'Cold-storage hub',
    description:
      'A regional cold-storage hub that may be built now or at any time in the next three years, at a build cost rising 4 % a year. Invented demo figures, EUR millions.',
    cases: [
      hubBase,
      {
        ...hubBase,
        name: 'Calmer market',
        settings: {
          ...hubBase.settings,
          volatility: 0.2,
          volatilitySource: { method: 'direct', note: 'Invented for the demo: the base case’s 28 % lowered to 20 % for long fixed-rent contracts.' },
        },
      },
    ],
    reviews: [
      {
        caseIndex: 0,
        outcome: 'in_review',
        recommendation:
          'Approve the right to build within three years, not the build itself: wait while the hub is worth less than its boundary, then build. (Invented demo text.)',
      },
    ],
  },
  {
    name: 'Staged pilot line',
    description: 'A pilot line for a new compound, funded in three stages; each payment buys the right to make the next. Invented demo figures, EUR millions.',
    cases: [pilotBase, { ...pilotBase, name: 'Higher hurdle rate', cashFlows: { ...pilotBase.cashFlows, wacc: 0.11 } }],
  },
  {
    name: 'Older extrusion line',
    description:
      'An ageing extrusion line that can be mothballed when margins thin (saving EUR 2 m a year in site costs net of upkeep) and restarted later, or closed for its scrap value. Invented demo figures, EUR millions.',
    cases: [lineBase, { ...lineBase, name: 'Without mothballing', options: lineBase.options!.filter((o) => o.kind !== 'mothball') }],
  },
];
