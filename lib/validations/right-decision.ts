/** A decision on a followed right, as the form and the API send it. */
import { z } from 'zod';
import { calendarDate } from './calendar-date';

export const rightDecisionSchema = z.object({
  decision: z.enum(['exercised', 'declined', 'postponed'], 'Choose exercised, declined or postponed.'),
  date: calendarDate.optional().meta({ description: 'YYYY-MM-DD; today when absent.' }),
  reason: z.string().trim().min(1, 'Give the reason: the committee will read it.').max(2000, 'Keep the reason under 2,000 characters.'),
});

export type RightDecisionInput = z.infer<typeof rightDecisionSchema>;
