'use client';

/**
 * Fields that hold text which is not a valid value tell the form around them, so the form can
 * refuse to save and say which field is wrong instead of saving the last valid values while the
 * screen shows others. A field outside any provider reports to nobody.
 */
import { createContext, useContext } from 'react';

export type ReportProblem = (field: string, problem: string | null) => void;

export const FieldProblems = createContext<ReportProblem>(() => {});

export function useReportProblem(): ReportProblem {
  return useContext(FieldProblems);
}
