/** The cash-flow timing conventions in words, as the editor, the documents, the workbook and the comparison print them. */
export const timingLabels = { 'end-of-year': 'End of year', 'mid-year': 'Mid-year' } as const;

export type CashFlowTiming = keyof typeof timingLabels;
