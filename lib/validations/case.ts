/** A case's inputs: its cash-flow schedule, valuation settings and option templates. */
import canonicalize from 'canonicalize';
import { z } from 'zod';
import { MAX_STEPS, optionTemplateSchema, readStoredTemplates, treeKindSchema } from '@/lattice';
import { cashFlowScheduleSchema } from '../cash-flows';

export const caseSettingsSchema = z.object({
  /** Annualised volatility of the project's value, as a fraction. */
  volatility: z.number().gt(0, 'Volatility must be above 0 %.').max(3, 'Volatility must be at most 300 %.'),
  /** Continuously compounded risk-free rate, as a fraction a year. */
  riskFreeRate: z.number().gt(-0.05, 'Use a rate above −5 %.').lt(0.25, 'Use a rate below 25 %.'),
  steps: z
    .number()
    .int('Enter a whole number.')
    .min(1, 'Use at least 1 step.')
    .max(MAX_STEPS, `Use at most ${MAX_STEPS.toLocaleString('en-GB')} steps.`),
  tree: treeKindSchema.default('crr'),
  /** Where the volatility comes from, in words a reviewer can check (the method and its inputs). */
  volatilitySource: z
    .object({
      method: z.enum(['direct', 'history', 'monte-carlo']),
      note: z.string().trim().max(2000, 'Keep the justification under 2,000 characters.'),
    })
    .optional(),
});

export const caseInputSchema = z.object({
  name: z.string().trim().min(1, 'Give the case a name.').max(120),
  cashFlows: cashFlowScheduleSchema,
  settings: caseSettingsSchema,
  options: z.array(optionTemplateSchema).max(12).default([]),
});

/** An edit of a stored case: its inputs and the version the edit was based on (an older one is refused, 409). */
export const caseSaveSchema = caseInputSchema.extend({ version: z.number().int().min(1, 'Send the version the edit was based on.') });

export const caseDuplicateSchema = z.object({ name: z.string().trim().min(1, 'Give the copy a name.').max(120) });

export type CaseSettings = z.infer<typeof caseSettingsSchema>;
export type CaseInput = z.input<typeof caseInputSchema>;

/** A snapshot's frozen inputs, with rights stored by an older engine read in today's shape (lattice/stored-model.ts). */
export function readStoredCaseInput(stored: unknown): CaseInput {
  const inputs = stored as CaseInput;
  return { ...inputs, options: readStoredTemplates(inputs.options) };
}

/**
 * A snapshot's frozen inputs as one text, equal for equal inputs whichever engine version stored
 * them: read in today's shape first, so a version approved before leeway-lattice 4.0.0 (rights
 * under `type`, `switch`) matches an unchanged resubmission. Canonical JSON (RFC 8785), so key
 * order does not matter, as in PostgreSQL's jsonb.
 */
export function storedInputsKey(stored: unknown): string {
  return canonicalize(readStoredCaseInput(stored)) ?? '';
}
