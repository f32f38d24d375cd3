/** An observation of a followed case's project value, as the form and the API send it. */
import { z } from 'zod';
import { calendarDate } from './calendar-date';

export const observationSchema = z.object({
  date: calendarDate,
  value: z.number('Give the value as a number.').gt(0, 'The project value must be above 0.').max(1e15, 'The value is implausibly large.'),
  note: z.string().trim().max(2000, 'Keep the note under 2,000 characters.').default(''),
  source: z.string().trim().max(200, 'Keep the source under 200 characters.').default(''),
});

export type ObservationInput = z.infer<typeof observationSchema>;
