'use client';

/**
 * Fields that hold text which is not a valid value tell the form around them, so the form can
 * refuse to save and say which field is wrong instead of saving the last valid values while the
 * screen shows others. A field outside any provider reports to nobody.
 */
import { createContext, useCallback, useContext, useState } from 'react';

export type ReportProblem = (field: string, problem: string | null) => void;

export const FieldProblems = createContext<ReportProblem>(() => {});

export function useReportProblem(): ReportProblem {
  return useContext(FieldProblems);
}

/**
 * The form's side: the fields' problems by label, and the reporter to provide to them.
 * `onProblem` runs when a field reports one (the editor marks itself unsaved: what is on
 * screen is no longer what is saved, even if no valid value changed).
 */
export function useFieldProblemList(onProblem?: () => void): { report: ReportProblem; problems: [field: string, problem: string][] } {
  const [byField, setByField] = useState<Record<string, string>>({});
  const report = useCallback<ReportProblem>(
    (field, problem) => {
      if (problem) onProblem?.();
      setByField((current) => {
        if ((current[field] ?? null) === problem) return current;
        const next = { ...current };
        if (problem) next[field] = problem;
        else delete next[field];
        return next;
      });
    },
    [onProblem],
  );
  return { report, problems: Object.entries(byField) };
}
