/**
 * Builds the engine's model from a stored case: V0, the payout schedule and the investment
 * come from the cash-flow schedule (lib/cash-flows.ts); volatility, rate, steps and tree from
 * the case's settings; the rights from its option templates. The horizon is the schedule's
 * last year (the value beyond it is carried by V, docs/engine.md §2).
 */
import type { ProjectModel } from '@/lattice';
import { analyseCashFlows } from './cash-flows';
import { AppError } from './errors';
import { caseInputSchema, type CaseInput } from './validations/case';

export function caseToModel(input: CaseInput): { model: ProjectModel; warnings: string[] } {
  const parsed = caseInputSchema.parse(input);
  const analysis = analyseCashFlows(parsed.cashFlows);
  if (analysis.blank)
    throw new AppError('unprocessable', 'The cash flows are all zero; enter the project’s yearly figures on the Cash flows tab.', {
      cashFlows: ['Every figure is zero.'],
    });
  if (!(analysis.underlyingValue > 0))
    throw new AppError('unprocessable', 'The operating cash flows are worth nothing or less (V0 ≤ 0), so there is no project value to put on a lattice.', {
      cashFlows: ['V0 must be positive.'],
    });
  const horizon = Math.max(1, parsed.cashFlows.rows.at(-1)!.year);
  const carriesOutlay = parsed.options.some((o) => o.kind === 'defer' || o.kind === 'stage');
  const model: ProjectModel = {
    underlying: {
      value: analysis.underlyingValue,
      volatility: parsed.settings.volatility,
      // Each year's cash is earned during the year: a yield over (t − 1, t], never a lump on the date.
      payoutPeriods: analysis.payouts.map((p) => ({ from: p.at - 1, to: p.at, fraction: p.fraction })),
    },
    riskFreeRate: parsed.settings.riskFreeRate,
    horizon,
    steps: parsed.settings.steps,
    tree: parsed.settings.tree,
    ...(carriesOutlay ? {} : { investment: analysis.investment }),
    options: parsed.options,
  };
  return { model, warnings: analysis.warnings };
}
