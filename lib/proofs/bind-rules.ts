import type { CircuitDocument } from '@/engine/document/schema';
import { compileRulesText, type BoundRule } from '@/engine/proof/rules';
import { AppError } from '@/lib/errors';

/**
 * A rules text bound to one revision's drawing. A text that does not parse or names parts the
 * drawing lacks is `invalid` on `field`: the message gives the first error's line and column,
 * `errors` lists them all.
 */
export function bindRulesText({ text, document, revisionNumber, field }: { text: string; document: CircuitDocument; revisionNumber: number; field: string }): BoundRule[] {
  const { rules, errors } = compileRulesText(text, document);
  const first = errors[0];
  if (first) {
    const more = errors.length > 1 ? ` (and ${errors.length - 1} more)` : '';
    const errorList = errors.map(({ line, column, message }) => ({ line, column, message }));
    throw new AppError('invalid', field, `${field}: line ${first.line}, column ${first.column}: ${first.message}${more} (against revision ${revisionNumber})`, field, errorList);
  }
  return rules;
}
