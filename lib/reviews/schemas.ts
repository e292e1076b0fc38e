import { z } from 'zod';

export const reviewIdSchema = z.string().uuid('not a review request id');

export const requestReviewBodySchema = z
  .object({
    revisionNumber: z.number().int().min(1, 'not a revision number'),
    reviewerIds: z
      .array(z.string().uuid('not a user id'))
      .min(1, 'name at least one reviewer')
      .max(10, 'at most 10 reviewers')
      .refine((ids) => new Set(ids).size === ids.length, 'name each reviewer once'),
    message: z.string().trim().min(1, 'say what the reviewers should look at').max(2000, 'at most 2000 characters'),
  })
  .strict();
export type RequestReviewBody = z.infer<typeof requestReviewBodySchema>;

const REVIEW_DECISIONS = ['approve', 'request_changes'] as const;
export type ReviewDecision = (typeof REVIEW_DECISIONS)[number];

export const decideReviewBodySchema = z
  .object({
    decision: z.enum(REVIEW_DECISIONS, 'either approve or request_changes'),
    note: z.string().trim().max(2000, 'at most 2000 characters').optional(),
  })
  .strict();
export type DecideReviewBody = z.infer<typeof decideReviewBodySchema>;

/** waiting: open requests naming me as a reviewer; requested: the requests I made, in any state. */
const REVIEW_BOXES = ['waiting', 'requested'] as const;

export const listReviewsQuerySchema = z.object({
  box: z.enum(REVIEW_BOXES, 'either waiting or requested').default('waiting'),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListReviewsQuery = z.infer<typeof listReviewsQuerySchema>;
