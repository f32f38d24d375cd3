/** An observation of a followed case's project value, as the form and the API send it. */
import { z } from 'zod';

export const observationSchema = z.object({
  date: z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, 'Write the date as YYYY-MM-DD.')
    .refine((d) => !Number.isNaN(Date.parse(`${d}T00:00:00Z`)) && new Date(`${d}T00:00:00Z`).toISOString().startsWith(d), 'That is not a calendar date.'),
  value: z.number('Give the value as a number.').gt(0, 'The project value must be above 0.').max(1e15, 'The value is implausibly large.'),
  note: z.string().trim().max(2000, 'Keep the note under 2,000 characters.').default(''),
  source: z.string().trim().max(200, 'Keep the source under 200 characters.').default(''),
});

export type ObservationInput = z.infer<typeof observationSchema>;
