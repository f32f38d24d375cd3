/** A cross-check request: how many paths (each pass) and the seed; both optional. */
import { z } from 'zod';
import { PATH_LIMITS } from '../cross-check/limits';

export const crossCheckStartSchema = z.strictObject({
  paths: z
    .int('Enter a whole number of paths.')
    .min(PATH_LIMITS.min, `Use at least ${PATH_LIMITS.min.toLocaleString('en-GB')} paths.`)
    .max(PATH_LIMITS.max, `Use at most ${PATH_LIMITS.max.toLocaleString('en-GB')} paths.`)
    .optional()
    .meta({ description: `Paths in each pass (fitting and checking), ${PATH_LIMITS.min}–${PATH_LIMITS.max}; ${PATH_LIMITS.default} when omitted.` }),
  seed: z
    .int()
    .min(0)
    .max(2 ** 31 - 1)
    .optional()
    .meta({ description: 'The same seed, paths and model give the same answer; chosen at random when omitted (and stored).' }),
});

export type CrossCheckStart = z.infer<typeof crossCheckStartSchema>;
