import { z } from 'zod';

export const faultSearchIdSchema = z.string().uuid('not a fault search id');

/** An empty body replays or searches on the circuit's newest revision. */
export const onRevisionBodySchema = z.object({ revisionNumber: z.number().int().min(1, 'not a revision number').optional() }).strict().optional();
export type OnRevisionBody = z.infer<typeof onRevisionBodySchema>;

export const listFaultSearchesQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListFaultSearchesQuery = z.infer<typeof listFaultSearchesQuerySchema>;
