import type { CircuitDocument } from '../document/schema';
import { text } from './document-edits';
import { componentFault } from './component-fault';
import type { SeverityRange } from './types';

const SHIFT: SeverityRange = { min: -0.02, max: 0.02, unit: 'm', label: 'Shift along the stroke', healthy: 0, quantity: 'length' };

const actuatedBy = (document: CircuitDocument, componentId: string) => document.links.filter((l) => l.kind === 'actuation' && l.to === componentId);

/**
 * A sensor or roller slid along the barrel or its bracket (loose clamp, knocked): it switches at
 * another stroke position. Positive shifts move it towards the extended end; ±20 mm covers a
 * loose clamp on a small cylinder (common practice).
 */
export const sensorShifted = componentFault({
  id: 'sensor-shifted',
  label: 'Sensor moved along the stroke',
  onOff: false,
  severity: SHIFT,
  appliesTo: (component, document) => actuatedBy(document, component.id).length > 0,
  severityFor: () => SHIFT,
  applyTo: (document, component, shiftM) => ({
    ...document,
    // The schema keeps stroke positions non-negative; a sensor pushed past the retracted end sits there.
    links: document.links.map((l) => (l.kind === 'actuation' && l.to === component.id ? { ...l, positionM: Math.max(0, (l.positionM ?? 0) + shiftM) } : l)),
  }),
  describe: (tag, shiftM) =>
    shiftM === 0 ? `${tag} sits where the drawing has it.` : `${tag} has moved ${text.mm(Math.abs(shiftM))} towards the ${shiftM > 0 ? 'extended' : 'retracted'} end.`,
});
