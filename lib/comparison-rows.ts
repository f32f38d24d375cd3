/**
 * The rows of a comparison of cases or of two versions of one case: headline figures, each
 * right's value and terms, the assumptions (with where the volatility comes from) and every
 * cash-flow line year by year. A row "differs" when any value is not the first one's. Written
 * once for the compare page and workbook (lib/comparison.ts) and for the reviewer's view of what
 * changed since a version was returned (lib/review/version-changes.ts).
 */
import { rightIds, type OptionTemplate, type ValuationResult } from '@/lattice';
import { analyseCashFlows, type CashFlowYear } from './cash-flows';
import { formatMoney } from './format';
import { describeOption } from './option-words';
import type { CaseInput } from './validations/case';
import { treeLabels } from './tree-words';
import { volatilitySourceText } from './volatility/method-words';
import { timingLabels } from './timing-words';

/** The groups of rows, in the order they are shown. */
export const comparisonGroups = ['Valuation', 'Rights', 'Assumptions', 'Cash flows'] as const;

export interface ComparisonRow {
  group: (typeof comparisonGroups)[number];
  label: string;
  values: (string | null)[];
  /** Raw numbers where the row is numeric, for charts and the workbook. */
  numbers?: (number | null)[];
  differs: boolean;
}

const lines: [keyof Omit<CashFlowYear, 'year'>, string][] = [
  ['revenue', 'Revenue'],
  ['operatingCost', 'Operating cost'],
  ['tax', 'Tax'],
  ['workingCapital', 'Working capital increase'],
  ['capex', 'Capex'],
];

/**
 * Inputs as typed, to every decimal that matters: a difference is always visible in the text.
 * (Results are shown as the app shows them; their rows differ when their text does.)
 */
const exact = (n: number) => n.toLocaleString('en-GB', { maximumFractionDigits: 8 });
const exactPercent = (fraction: number) => `${exact(Number((fraction * 100).toPrecision(12)))} %`;

export function comparisonRows(inputs: CaseInput[], results: (ValuationResult | null)[], currencies: string[]): ComparisonRow[] {
  const rows: ComparisonRow[] = [];
  const add = (group: ComparisonRow['group'], label: string, values: (string | null)[], numbers?: (number | null)[]) =>
    rows.push({ group, label, values, numbers, differs: values.some((v) => v !== values[0]) });
  const money = (pick: (r: ValuationResult) => number | null) =>
    [results.map((r, k) => (r ? formatMoney(pick(r), currencies[k]) : null)), results.map((r) => (r ? pick(r) : null))] as const;

  add('Valuation', 'Static NPV', ...money((r) => r.staticNpv));
  add('Valuation', 'Option premium', ...money((r) => r.optionPremium));
  add('Valuation', 'of which a better plan', ...money((r) => r.premiumSplit?.betterPlan ?? null));
  add('Valuation', 'of which flexibility under uncertainty', ...money((r) => r.premiumSplit?.uncertainty ?? null));
  add('Valuation', 'Expanded NPV', ...money((r) => r.expandedNpv));

  // Unnamed rights go by the ids the results give them (expand-1, …), so their figures are found.
  const idsOf = inputs.map((input) => rightIds((input.options ?? []) as OptionTemplate[]));
  const optionIds = [...new Set(idsOf.flat())];
  for (const id of optionIds) {
    add('Rights', `${id}: incremental value`, ...money((r) => r.rights.find((s) => s.id === id)?.incremental ?? null));
    add(
      'Rights',
      `${id}: terms`,
      inputs.map((input, k) => {
        const template = (input.options ?? [])[idsOf[k]!.indexOf(id)];
        return template ? describeOption(template, currencies[k]) : null;
      }),
    );
  }

  const analyses = inputs.map((input) => analyseCashFlows(input.cashFlows));
  add(
    'Assumptions',
    'Underlying value V₀',
    analyses.map((a, k) => formatMoney(a.underlyingValue, currencies[k])),
    analyses.map((a) => a.underlyingValue),
  );
  add(
    'Assumptions',
    'Volatility',
    inputs.map((i) => exactPercent(i.settings.volatility)),
    inputs.map((i) => i.settings.volatility),
  );
  add(
    'Assumptions',
    'Where the volatility comes from',
    inputs.map((i) => volatilitySourceText(i.settings.volatilitySource)),
  );
  add(
    'Assumptions',
    'Risk-free rate',
    inputs.map((i) => exactPercent(i.settings.riskFreeRate)),
    inputs.map((i) => i.settings.riskFreeRate),
  );
  add(
    'Assumptions',
    'WACC',
    inputs.map((i) => exactPercent(i.cashFlows.wacc)),
    inputs.map((i) => i.cashFlows.wacc),
  );
  add(
    'Assumptions',
    'Cash-flow timing',
    inputs.map((i) => timingLabels[i.cashFlows.timing ?? 'end-of-year']),
  );
  add(
    'Assumptions',
    'Lattice steps',
    inputs.map((i) => String(i.settings.steps)),
    inputs.map((i) => i.settings.steps),
  );
  add(
    'Assumptions',
    'Tree',
    inputs.map((i) => treeLabels[i.settings.tree ?? 'crr']),
  );
  add(
    'Assumptions',
    'Horizon (years)',
    inputs.map((i) => String(i.cashFlows.rows.at(-1)?.year ?? 0)),
    inputs.map((i) => i.cashFlows.rows.at(-1)?.year ?? 0),
  );

  // Every line, year by year, across the longest schedule: a year a case does not have is empty.
  const lastYear = Math.max(...inputs.map((i) => i.cashFlows.rows.at(-1)?.year ?? 0));
  for (const [key, label] of lines)
    for (let year = 0; year <= lastYear; year++) {
      const numbers = inputs.map((i) => i.cashFlows.rows.find((r) => r.year === year)?.[key] ?? null);
      add(
        'Cash flows',
        `${label}, year ${year}`,
        numbers.map((n) => (n === null ? null : exact(n))),
        numbers,
      );
    }
  return rows;
}
