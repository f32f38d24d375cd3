/** What analysts and reviewers send in the review workflow. */
import { z } from 'zod';
import { commentSections } from '@/db/queries/reviews';

/** The analyst's own recommendation to the committee: the board pack prints it (Leeway's reading of the figures is only a suggestion). */
export const submitSchema = z.object({
  recommendation: z.string().trim().min(1, 'Write your recommendation to the committee.').max(4000, 'Keep the recommendation under 4,000 characters.'),
});

export const returnSchema = z.object({ reason: z.string().trim().min(3, 'Say why the case goes back (at least a few words).').max(2000) });

export const commentSchema = z.object({
  section: z
    .string()
    .refine((s) => (commentSections as readonly string[]).includes(s) || /^option:.{1,64}$/.test(s), 'Choose a section of the case.')
    .meta({ description: `One of ${commentSections.join(', ')}, or option:<option id>.` }),
  body: z.string().trim().min(1, 'Write a comment.').max(4000),
});

/** The board pack's page size (`?size=`). */
export const pageSizeSchema = z.enum(['A4', 'LETTER'], { error: 'size must be A4 or LETTER.' });

const reviewStatuses = ['in_review', 'approved', 'returned'] as const;

/**
 * Which decisions the review queue lists (`?status=`, comma-separated); in review by default. One
 * message names the parameter and its values, as `?size=` does (an array's own check answered
 * `{"0": ["Invalid option: …"]}`, naming neither).
 */
export const reviewStatusesSchema = z
  .string()
  .refine(
    (s) => s.split(',').every((x) => (reviewStatuses as readonly string[]).includes(x)),
    'status must be in_review, approved or returned, or several of them comma-separated.',
  )
  .transform((s) => s.split(',') as (typeof reviewStatuses)[number][]);
