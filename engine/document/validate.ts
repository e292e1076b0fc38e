import type { z } from 'zod';
import { circuitDocumentSchema, type CircuitDocument } from './schema';

export type DocumentValidation = { ok: true; document: CircuitDocument } | { ok: false; messages: string[] };

/**
 * Validates raw JSON as a circuit document. Messages name the component (by tag
 * when it has one) or tube and the field, e.g. `component 1V1 (components[2]).parameters.conductance: …`.
 */
export function validateDocument(raw: unknown): DocumentValidation {
  const result = circuitDocumentSchema.safeParse(raw);
  if (result.success) return { ok: true, document: result.data };
  return { ok: false, messages: result.error.issues.map((issue) => describeIssue(raw, issue)) };
}

function describeIssue(raw: unknown, issue: z.core.$ZodIssue): string {
  const [collection, index, ...rest] = issue.path;
  const field = rest.map(String).join('.');
  if ((collection === 'components' || collection === 'tubes' || collection === 'wires' || collection === 'links') && typeof index === 'number') {
    const item = (raw as Record<string, unknown[]>)[collection]?.[index] as Record<string, unknown> | undefined;
    const name = typeof item?.tag === 'string' ? item.tag : typeof item?.id === 'string' ? item.id : `#${index}`;
    const noun = collection.slice(0, -1);
    return `${noun} ${name} (${collection}[${index}])${field ? `.${field}` : ''}: ${issue.message}`;
  }
  const path = issue.path.map(String).join('.');
  return `${path || 'document'}: ${issue.message}`;
}
