/** Organisation defaults, shared by the settings form, its server action and the API route. */
import { z } from 'zod';

export const settingsSchema = z.object({
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]{3}$/, 'Use a three-letter ISO 4217 code, such as EUR or USD.'),
  riskFreeRate: z.coerce.number({ error: 'Enter a number.' }).min(-0.05, 'Must be at least −5 %.').max(0.25, 'Must be at most 25 %.'),
  wacc: z.coerce.number({ error: 'Enter a number.' }).min(0, 'Must be at least 0 %.').max(0.5, 'Must be at most 50 %.'),
  fiscalYearStartMonth: z.coerce.number().int().min(1, 'Choose a month.').max(12, 'Choose a month.'),
  /** Days before a followed right's window closes that its alert goes out; kept as it is when absent. */
  alertDaysBeforeClose: z.coerce
    .number({ error: 'Enter a whole number of days.' })
    .int('Enter a whole number of days.')
    .min(1, 'Must be at least 1 day.')
    .max(365, 'Must be at most 365 days.')
    .optional(),
});

export type SettingsInput = z.infer<typeof settingsSchema>;
