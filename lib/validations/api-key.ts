/** API key inputs, shared by the settings form and the API. */
import { z } from 'zod';

/** Roles a key can carry: what an admin may give a member, but never admin itself. */
export const apiKeyRoles = ['analyst', 'reviewer', 'viewer'] as const;

export const apiKeyCreateSchema = z.object({
  name: z.string().trim().min(1, 'Give the key a name, such as the system that will use it.').max(80, 'Use at most 80 characters.'),
  role: z.enum(apiKeyRoles, 'Choose analyst, reviewer or viewer.'),
  expiresInDays: z
    .number('Give the number of days as a whole number.')
    .int('Give the number of days as a whole number.')
    .min(1, 'A key lives at least one day.')
    .max(730, 'A key lives at most 730 days (two years); create a new one then.')
    .optional(),
});

export type ApiKeyCreate = z.infer<typeof apiKeyCreateSchema>;
