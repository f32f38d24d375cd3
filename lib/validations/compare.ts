/** Which cases to compare: two to four case ids, as the `cases` query parameter (comma-separated). */
import { z } from 'zod';

export const compareQuerySchema = z
  .string({ error: 'Name the cases to compare: ?cases=id1,id2' })
  .transform((s) => [
    ...new Set(
      s
        .split(',')
        .map((x) => x.trim())
        .filter(Boolean),
    ),
  ])
  .pipe(z.array(z.string().max(64)).min(2, 'Compare at least two cases.').max(4, 'Compare at most four cases.'));
