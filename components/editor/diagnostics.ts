import { compile } from '@/engine/solver/compile';
import type { Diagnostic } from '@/engine/solver/model';
import type { CircuitDocument } from '@/engine/document/schema';

export type Severity = Diagnostic['severity'];

/** The engine's checks of a drawing, errors first (compiling a drawing of a few dozen parts takes milliseconds). */
export function checksOf(document: CircuitDocument): Diagnostic[] {
  const { diagnostics } = compile(document);
  return [...diagnostics].sort((a, b) => (a.severity === b.severity ? 0 : a.severity === 'error' ? -1 : 1));
}

/** The worst severity found on each component, tube and wire, for marking them on the drawing. */
export function problemsByItem(diagnostics: readonly Diagnostic[]): Map<string, Severity> {
  const worst = new Map<string, Severity>();
  for (const d of diagnostics) {
    for (const id of [d.componentId, d.tubeId, d.wireId]) {
      if (id && worst.get(id) !== 'error') worst.set(id, d.severity);
    }
  }
  return worst;
}

/**
 * The checks of the latest drawing, worked out again only when something they read changed:
 * everything but where the parts are drawn. Moving a part (a drag changes the document at every
 * pointer move) leaves those the same objects, so a drag compiles nothing.
 */
export function memoizedChecks(): (document: CircuitDocument) => Diagnostic[] {
  let last: { content: readonly unknown[]; checks: Diagnostic[] } | null = null;
  return (document) => {
    const content = [document.settings, document.tubes, document.wires, document.links, ...document.components.flatMap((c) => [c.id, c.type, c.tag, c.label, c.parameters])];
    if (!last || last.content.length !== content.length || last.content.some((x, i) => x !== content[i])) last = { content, checks: checksOf(document) };
    return last.checks;
  };
}
