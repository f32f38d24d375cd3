/** Project inputs, shared by forms and the API. */
import { z } from 'zod';

export const projectCreateSchema = z.object({
  name: z.string().trim().min(1, 'Give the project a name.').max(120),
  description: z.string().trim().max(2000).default(''),
  currency: z
    .string()
    .trim()
    .toUpperCase()
    .regex(/^[A-Z]{3}$/, 'Use a three-letter ISO 4217 code, such as EUR.')
    .optional(),
});

export const projectUpdateSchema = z.object({
  name: z.string().trim().min(1).max(120).optional(),
  description: z.string().trim().max(2000).optional(),
  status: z.enum(['active', 'archived']).optional(),
});

export type ProjectCreate = z.infer<typeof projectCreateSchema>;
export type ProjectUpdate = z.infer<typeof projectUpdateSchema>;
