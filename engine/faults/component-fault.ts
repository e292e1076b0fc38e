import type { CircuitComponent, CircuitDocument } from '../document/schema';
import type { FaultType, SeverityRange } from './types';

/** What a fault on a component declares; `componentFault` adds finding the parts by tag. */
export interface ComponentFaultDefinition {
  id: string;
  label: string;
  onOff: boolean;
  severity: SeverityRange;
  appliesTo(component: CircuitComponent, document: CircuitDocument): boolean;
  severityFor(component: CircuitComponent): SeverityRange;
  applyTo(document: CircuitDocument, component: CircuitComponent, severity: number): CircuitDocument;
  describe(tag: string, severity: number): string;
}

export function componentFault(def: ComponentFaultDefinition): FaultType {
  const { severityFor, applyTo, ...rest } = def;
  return {
    ...rest,
    targets: (document) => document.components.filter((c) => def.appliesTo(c, document)).map((c) => ({ tag: c.tag, severity: severityFor(c) })),
    apply(document, tag, severity) {
      const component = document.components.find((c) => c.tag === tag);
      if (!component || !def.appliesTo(component, document)) throw new Error(`${def.label} does not apply to ${tag}`);
      return applyTo(document, component, severity);
    },
  };
}
