/**
 * Side-by-side comparison of two to four cases (of one project or several): their status and the
 * rows of lib/comparison-rows.ts (figures of each case's latest stored valuation, options,
 * assumptions with the volatility's source, cash flows year by year). A row "differs" when any
 * case's value is not the first case's.
 */
import 'server-only';
import { db } from '@/db';
import { findCasesWithProject } from '@/db/queries/cases';
import { latestRunsOfCases } from '@/db/queries/valuation-runs';
import { comparisonRows, type ComparisonRow } from './comparison-rows';
import { AppError } from './errors';
import { statusLabels } from './review/transitions';
import type { CaseInput } from './validations/case';
import type { CaseStatus } from '@/db/types';
import { readStoredResult } from '@/lattice';

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
  /** The engine that computed the figures (null when not valued yet). */
  engineVersion: string | null;
  staticNpv: number | null;
  optionPremium: number | null;
  expandedNpv: number | null;
}

export type { ComparisonRow };

export interface Comparison {
  cases: ComparedCase[];
  rows: ComparisonRow[];
}

export async function compareCases(orgId: string, caseIds: string[]): Promise<Comparison> {
  const found = await findCasesWithProject(db, { orgId, caseIds });
  const byId = new Map(found.map((c) => [c.id, c]));
  const missing = caseIds.filter((id) => !byId.has(id));
  if (missing.length > 0) throw new AppError('not_found', `No such case in your organisation: ${missing.join(', ')}.`);
  const runs = await latestRunsOfCases(db, { orgId, caseIds });
  const runOf = new Map(runs.map((r) => [r.case_id, r]));

  const ordered = caseIds.map((id) => byId.get(id)!);
  const results = ordered.map((c) => (runOf.has(c.id) ? readStoredResult(runOf.get(c.id)!.result) : null));
  const inputs = ordered.map((c) => ({ name: c.name, cashFlows: c.cash_flows, settings: c.settings, options: c.options }) as CaseInput);
  const cases: ComparedCase[] = ordered.map((c, k) => {
    const run = runOf.get(c.id);
    return {
      id: c.id,
      projectId: c.project_id,
      projectName: c.project_name,
      caseName: c.name,
      currency: c.currency,
      status: c.status,
      valuedAt: run ? new Date(run.created_at).toISOString() : null,
      figuresVersion: run?.case_version ?? null,
      version: c.version,
      engineVersion: run?.engine_version ?? null,
      staticNpv: results[k]?.staticNpv ?? null,
      optionPremium: results[k]?.optionPremium ?? null,
      expandedNpv: results[k]?.expandedNpv ?? null,
    };
  });

  const statusRow: ComparisonRow = {
    group: 'Valuation',
    label: 'Status',
    values: cases.map((c) => statusLabels[c.status]),
    differs: cases.some((c) => c.status !== cases[0]!.status),
  };
  // Figures from different engine versions can differ for that reason alone: say which computed each.
  const engineRow: ComparisonRow = {
    group: 'Valuation',
    label: 'Computed by',
    values: cases.map((c) => c.engineVersion ?? 'not valued yet'),
    differs: cases.some((c) => c.engineVersion !== cases[0]!.engineVersion),
  };
  const rows = [
    statusRow,
    engineRow,
    ...comparisonRows(
      inputs,
      results,
      cases.map((c) => c.currency),
    ),
  ];
  return { cases, rows };
}
