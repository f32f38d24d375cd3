/**
 * Side-by-side comparison of two to four cases (of one project or several): the headline
 * figures of each case's latest stored valuation, each option's value, and the assumptions that
 * drive them. A row "differs" when any case's value is not the first case's.
 */
import 'server-only';
import { db } from '@/db';
import type { ValuationResult } from '@/lattice';
import { analyseCashFlows } from './cash-flows';
import { AppError } from './errors';
import { formatMoney, formatPercent } from './format';
import { describeOption } from './option-words';
import { statusLabels } from './review/transitions';
import type { CaseInput } from './validations/case';
import type { CaseStatus } from '@/db/types';

export interface ComparedCase {
  id: string;
  projectId: string;
  projectName: string;
  caseName: string;
  currency: string;
  status: CaseStatus;
  valuedAt: string | null;
  /** The case version the figures are of, and the case's version now. */
  figuresVersion: number | null;
  version: number;
  staticNpv: number | null;
  optionPremium: number | null;
  expandedNpv: number | null;
}

export interface ComparisonRow {
  group: 'Valuation' | 'Options' | 'Assumptions';
  label: string;
  values: (string | null)[];
  /** Raw numbers where the row is numeric, for charts and the workbook. */
  numbers?: (number | null)[];
  differs: boolean;
}

export interface Comparison {
  cases: ComparedCase[];
  rows: ComparisonRow[];
}

export async function compareCases(orgId: string, caseIds: string[]): Promise<Comparison> {
  const found = await db
    .selectFrom('case')
    .innerJoin('project', 'project.id', 'case.project_id')
    .selectAll('case')
    .select(['project.name as project_name', 'project.currency'])
    .where('case.organization_id', '=', orgId)
    .where('case.id', 'in', caseIds)
    .execute();
  const byId = new Map(found.map((c) => [c.id, c]));
  const missing = caseIds.filter((id) => !byId.has(id));
  if (missing.length > 0) throw new AppError('not_found', `No such case in your organisation: ${missing.join(', ')}.`);
  const runs = await db
    .selectFrom('valuation_run')
    .select(['case_id', 'result', 'created_at', 'case_version'])
    .distinctOn('case_id')
    .where('organization_id', '=', orgId)
    .where('case_id', 'in', caseIds)
    .orderBy('case_id')
    .orderBy('created_at', 'desc')
    .execute();
  const runOf = new Map(runs.map((r) => [r.case_id, r]));

  const ordered = caseIds.map((id) => byId.get(id)!);
  const results = ordered.map((c) => (runOf.get(c.id)?.result as ValuationResult | undefined) ?? null);
  const inputs = ordered.map((c) => ({ name: c.name, cashFlows: c.cash_flows, settings: c.settings, options: c.options }) as CaseInput);
  const cases: ComparedCase[] = ordered.map((c, k) => ({
    id: c.id,
    projectId: c.project_id,
    projectName: c.project_name,
    caseName: c.name,
    currency: c.currency,
    status: c.status,
    valuedAt: runOf.get(c.id) ? new Date(runOf.get(c.id)!.created_at).toISOString() : null,
    figuresVersion: runOf.get(c.id)?.case_version ?? null,
    version: c.version,
    staticNpv: results[k]?.staticNpv ?? null,
    optionPremium: results[k]?.optionPremium ?? null,
    expandedNpv: results[k]?.expandedNpv ?? null,
  }));

  const rows: ComparisonRow[] = [];
  const add = (group: ComparisonRow['group'], label: string, values: (string | null)[], numbers?: (number | null)[]) =>
    rows.push({ group, label, values, numbers, differs: values.some((v) => v !== values[0]) });
  const money = (pick: (r: ValuationResult) => number | null) =>
    [results.map((r, k) => (r ? formatMoney(pick(r), cases[k]!.currency) : null)), results.map((r) => (r ? pick(r) : null))] as const;

  add(
    'Valuation',
    'Status',
    cases.map((c) => statusLabels[c.status]),
  );
  add('Valuation', 'Static NPV', ...money((r) => r.staticNpv));
  add('Valuation', 'Option premium', ...money((r) => r.optionPremium));
  add('Valuation', 'of which a better plan', ...money((r) => r.premiumSplit?.betterPlan ?? null));
  add('Valuation', 'of which flexibility under uncertainty', ...money((r) => r.premiumSplit?.uncertainty ?? null));
  add('Valuation', 'Expanded NPV', ...money((r) => r.expandedNpv));

  const optionIds = [...new Set(results.flatMap((r) => r?.switches.map((s) => s.id) ?? []))];
  for (const id of optionIds) {
    add('Options', `${id}: incremental value`, ...money((r) => r.switches.find((s) => s.id === id)?.incremental ?? null));
    add(
      'Options',
      `${id}: terms`,
      inputs.map((input, k) => {
        const template = (input.options ?? []).find((o, j) => (o.id ?? `option ${j + 1}`) === id);
        return template ? describeOption(template, cases[k]!.currency) : null;
      }),
    );
  }

  const analyses = inputs.map((input) => analyseCashFlows(input.cashFlows));
  add(
    'Assumptions',
    'Underlying value V₀',
    analyses.map((a, k) => formatMoney(a.underlyingValue, cases[k]!.currency)),
    analyses.map((a) => a.underlyingValue),
  );
  add(
    'Assumptions',
    'Volatility',
    inputs.map((i) => formatPercent(i.settings.volatility)),
    inputs.map((i) => i.settings.volatility),
  );
  add(
    'Assumptions',
    'Risk-free rate',
    inputs.map((i) => formatPercent(i.settings.riskFreeRate, 2)),
    inputs.map((i) => i.settings.riskFreeRate),
  );
  add(
    'Assumptions',
    'WACC',
    inputs.map((i) => formatPercent(i.cashFlows.wacc)),
    inputs.map((i) => i.cashFlows.wacc),
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
    inputs.map((i) => i.settings.tree ?? 'crr'),
  );
  add(
    'Assumptions',
    'Horizon (years)',
    inputs.map((i) => String(i.cashFlows.rows.at(-1)?.year ?? 0)),
    inputs.map((i) => i.cashFlows.rows.at(-1)?.year ?? 0),
  );
  return { cases, rows };
}
