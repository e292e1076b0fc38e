import { z } from 'zod';

export const logIdSchema = z.string().uuid('not a log id');

export const listLogsQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListLogsQuery = z.infer<typeof listLogsQuerySchema>;

/**
 * The name a log is kept under: the last path segment of what the browser sent, without control
 * characters (PostgreSQL text holds no NUL, and a header value no line break).
 */
export const logFileNameSchema = z
  .string()
  .transform((name) => name.split(/[\\/]/).pop()!.trim())
  .pipe(
    z
      .string()
      .min(1, 'give the file a name')
      .max(255, 'at most 255 characters')
      .refine((name) => !/[\u0000-\u001f\u007f]/.test(name), 'contains a control character'),
  );
