import type { z } from 'zod';
import { AppError } from '@/lib/errors';

/** Largest JSON body any route accepts unless it says otherwise. */
export const DEFAULT_BODY_LIMIT_BYTES = 1024 * 1024;

/** Turns the first zod issue into an `invalid:<field>` error naming the field. */
export function zodToAppError(error: z.ZodError, prefix?: string): AppError {
  const issue = error.issues[0];
  const pathParts = [prefix, ...(issue?.path ?? []).map(String)].filter(Boolean);
  const field = pathParts.join('.') || 'body';
  const message = issue ? `${field}: ${issue.message}` : 'Invalid input';
  return new AppError('invalid', field, message, field);
}

export function parseWith<T extends z.ZodType>(schema: T, value: unknown, prefix?: string): z.infer<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw zodToAppError(result.error, prefix);
  return result.data;
}

/** Reads a JSON request body with a size limit, then validates it. */
export async function readJsonBody<T extends z.ZodType>(
  request: Request,
  schema: T,
  limitBytes = DEFAULT_BODY_LIMIT_BYTES,
): Promise<z.infer<T>> {
  const declared = Number(request.headers.get('content-length') ?? '0');
  if (declared > limitBytes) throw oversize(limitBytes);
  const text = await request.text();
  if (Buffer.byteLength(text, 'utf8') > limitBytes) throw oversize(limitBytes);
  let value: unknown;
  try {
    value = text.length ? JSON.parse(text) : undefined;
  } catch {
    throw new AppError('invalid', 'body', 'Request body is not valid JSON', 'body');
  }
  return parseWith(schema, value);
}

/** Validates URL search parameters (all strings) against a schema that coerces. */
export function parseSearchParams<T extends z.ZodType>(request: Request, schema: T): z.infer<T> {
  const params = Object.fromEntries(new URL(request.url).searchParams.entries());
  return parseWith(schema, params);
}

function oversize(limitBytes: number): AppError {
  return new AppError('invalid', 'body', `Request body exceeds ${Math.round(limitBytes / 1024)} KiB`, 'body');
}
