'use client';

/**
 * What the editor derives from the draft on every change: the cash-flow analysis, the horizon,
 * the engine model (or why there is none yet, with the cards the refusal names), and the most
 * steps the engine's budget allows for these rights. Pure derivation: nothing is stored.
 */
import { useMemo } from 'react';
import { largestStepsWithinBudget, MAX_STEPS, ModelError, prepareModel, type OptionTemplate, type ProjectModel } from '@/lattice';
import { caseToModel } from '@/lib/case-model';
import { analyseCashFlows, type CashFlowAnalysis } from '@/lib/cash-flows';
import { issueInWords } from '@/lib/issue-words';
import type { CaseInput } from '@/lib/validations/case';

export type Built = { model: ProjectModel; modes: string[]; start: string } | { problem: string; cards?: Record<number, string> };

export function useDraftModel(draft: CaseInput) {
  const analysis: CashFlowAnalysis | null = useMemo(() => {
    try {
      return analyseCashFlows(draft.cashFlows);
    } catch {
      return null;
    }
  }, [draft.cashFlows]);
  const horizon = Math.max(1, draft.cashFlows.rows.at(-1)?.year ?? 1);

  const built = useMemo((): Built => {
    try {
      const { model } = caseToModel(draft);
      const { compiled } = prepareModel(model);
      return { model, modes: compiled.modes.map((m) => m.id), start: compiled.modes[compiled.start]!.id };
    } catch (error) {
      if (error instanceof ModelError) {
        const options = (draft.options ?? []) as OptionTemplate[];
        // A refusal that names an option marks its card too.
        const cards: Record<number, string> = {};
        for (const issue of error.issues) {
          const index = issue.field.match(/^options\[(\d+)\]/)?.[1];
          if (index !== undefined) cards[Number(index)] = issueInWords(issue.message, options);
        }
        return { problem: error.issues.map((i) => issueInWords(i.message, options)).join('; '), cards };
      }
      return { problem: error instanceof Error ? error.message : 'The case cannot be valued yet.' };
    }
  }, [draft]);
  const model = 'model' in built ? built.model : null;
  // The steps field allows what the engine's budget allows for these rights (it refuses more).
  // Read off the model already built from the draft, not a second build of it.
  const maxSteps = useMemo(() => (model ? largestStepsWithinBudget(model) : MAX_STEPS), [model]);
  return { analysis, horizon, built, model, maxSteps };
}
