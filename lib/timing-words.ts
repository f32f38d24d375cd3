import type { CashFlowSchedule } from './cash-flows';

/** A cash-flow timing convention (lib/cash-flows.ts's schema). */
export type CashFlowTiming = NonNullable<CashFlowSchedule['timing']>;

/** The cash-flow timing conventions in words, as the editor, the documents, the workbook and the comparison print them. */
export const timingLabels: Record<CashFlowTiming, string> = { 'end-of-year': 'End of year', 'mid-year': 'Mid-year' };
