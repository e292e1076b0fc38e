import type { CircuitDocument, Tube } from '../document/schema';
import { text } from './document-edits';
import type { FaultType, SeverityRange } from './types';

/** Up to 5e-9 m³/(s·Pa): a cut tube or a loose push-in fitting on a small line is of the order of the valve's own passage (from memory). */
const range = (healthy: number): SeverityRange => ({ min: 0, max: Math.max(5e-9, healthy), unit: 'm³/(s·Pa)', label: 'Leak conductance', healthy, quantity: 'conductance' });

/** A leaking tube or fitting, vented to atmosphere. Tubes carry no tag, so the tube's id stands in for one. */
export const tubeLeak: FaultType = {
  id: 'tube-leak',
  label: 'Tube or fitting leaking',
  onOff: false,
  severity: range(0),
  appliesTo: () => false,
  targets: (document) => document.tubes.map((t) => ({ tag: t.id, severity: range(t.leakConductance ?? 0) })),
  apply(document: CircuitDocument, tubeId, conductance) {
    if (!document.tubes.some((t) => t.id === tubeId)) throw new Error(`no tube ${tubeId} in the circuit`);
    return { ...document, tubes: document.tubes.map((t): Tube => (t.id === tubeId ? { ...t, leakConductance: Math.min(Math.max(conductance, 0), 1e-6) } : t)) };
  },
  describe: (tubeId, c) => `Tube ${tubeId} leaks to atmosphere (${text.conductance(c)}).`,
};
