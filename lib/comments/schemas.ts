import { z } from 'zod';
import { revisionNumberSchema } from '@/lib/circuits/schemas';

export const commentIdSchema = z.string().uuid('not a comment id');

/** Ids as the circuit document spells them. */
const documentId = z.string().min(1).max(64);

/** The kinds of `CommentAnchor` (models/comment.ts). */
const commentAnchorSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('circuit') }).strict(),
  z.object({ kind: z.literal('component'), componentId: documentId }).strict(),
  z.object({ kind: z.literal('tube'), tubeId: documentId }).strict(),
  z.object({ kind: z.literal('run'), runId: z.string().uuid('not a run id'), timeS: z.number().finite().nonnegative() }).strict(),
]);

/** Plain text, kept as written apart from the surrounding white space. */
const commentBody = z
  .string()
  .trim()
  .min(1, 'write something')
  .max(4000, 'at most 4000 characters')
  // PostgreSQL text cannot hold a NUL character.
  .refine((body) => !body.includes('\u0000'), 'contains a NUL character');

export const createCommentBodySchema = z
  .object({
    revisionNumber: z.number().int().min(1, 'not a revision number').optional(),
    anchor: commentAnchorSchema.optional(),
    body: commentBody,
    parentId: commentIdSchema.optional(),
  })
  .strict()
  .superRefine((input, ctx) => {
    // A reply is pinned where its thread is, so only a new thread says where.
    if (input.parentId) return;
    if (input.revisionNumber === undefined) ctx.addIssue({ code: 'custom', path: ['revisionNumber'], message: 'required for a new thread' });
    else if (!input.anchor) ctx.addIssue({ code: 'custom', path: ['anchor'], message: 'required for a new thread' });
  });
export type CreateCommentBody = z.infer<typeof createCommentBodySchema>;

export const editCommentBodySchema = z.object({ body: commentBody }).strict();

export const listCommentsQuerySchema = z.object({
  revision: revisionNumberSchema.optional(),
});
