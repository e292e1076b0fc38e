import { z } from 'zod';
import { circuitDocumentSchema } from '@/engine/document/schema';

export const CIRCUIT_SORTS = ['title', 'updated', 'revisions', 'author'] as const;

export const listCircuitsQuerySchema = z.object({
  sort: z.enum(CIRCUIT_SORTS).default('updated'),
  dir: z.enum(['asc', 'desc']).default('desc'),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListCircuitsQuery = z.infer<typeof listCircuitsQuerySchema>;

export const createCircuitBodySchema = z
  .object({
    title: z.string().trim().min(1, 'a title is required').max(120, 'at most 120 characters'),
    description: z.string().trim().max(2000, 'at most 2000 characters').default(''),
    message: z.string().trim().max(500, 'at most 500 characters').default('First revision'),
    document: circuitDocumentSchema.optional(),
  })
  .strict();
export type CreateCircuitBody = z.infer<typeof createCircuitBodySchema>;

export const circuitIdSchema = z.string().uuid('not a circuit id');

export const appendRevisionBodySchema = z
  .object({
    document: circuitDocumentSchema,
    message: z.string().trim().min(1, 'say what changed').max(500, 'at most 500 characters'),
    /** The circuit's lock version the writer read; a stale one is a conflict, not an overwrite. */
    expectedLockVersion: z.number().int().min(0),
  })
  .strict();

export const revisionNumberSchema = z.coerce.number().int('not a revision number').min(1, 'not a revision number').max(1_000_000, 'not a revision number');

export const listRevisionsQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListRevisionsQuery = z.infer<typeof listRevisionsQuerySchema>;

export const restoreRevisionBodySchema = z
  .object({
    expectedLockVersion: z.number().int().min(0),
    message: z.string().trim().min(1, 'say why, or leave the message out').max(500, 'at most 500 characters').optional(),
  })
  .strict();

/** Both ends are optional: `to` defaults to the newest revision, `from` to the one before `to`. */
export const compareQuerySchema = z.object({
  from: revisionNumberSchema.optional(),
  to: revisionNumberSchema.optional(),
});
