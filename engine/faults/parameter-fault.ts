import type { CircuitComponent, CircuitDocument } from '../document/schema';
import { numberParameter, withParameters } from './document-edits';
import { componentFault } from './component-fault';
import type { FaultType, SeverityRange } from './types';

/**
 * A fault that is one number parameter of a component set to another value: the severity is
 * the value on the machine, and the drawing's own value is the healthy one.
 */
export function numberParameterFault(def: {
  id: string;
  label: string;
  /** The component types it can happen on, or a test of a component. */
  appliesTo: readonly string[] | ((component: CircuitComponent) => boolean);
  parameter: string;
  /** The parameter's usual value, for the range shown when no part is named. */
  nominal: number;
  /** The range on a part whose drawing sets `healthy` (widened to take `healthy` in if need be). */
  range(healthy: number): Omit<SeverityRange, 'healthy'>;
  describe(tag: string, severity: number): string;
}): FaultType {
  const severityFor = (component: CircuitComponent): SeverityRange => {
    const healthy = numberParameter(component, def.parameter);
    const range = def.range(healthy);
    return { ...range, min: Math.min(range.min, healthy), max: Math.max(range.max, healthy), healthy };
  };
  return componentFault({
    id: def.id,
    label: def.label,
    onOff: false,
    severity: { ...def.range(def.nominal), healthy: def.nominal },
    appliesTo: (component) => (typeof def.appliesTo === 'function' ? def.appliesTo(component) : def.appliesTo.includes(component.type)),
    severityFor,
    applyTo: (document: CircuitDocument, component, severity) => withParameters(document, component, { [def.parameter]: severity }),
    describe: def.describe,
  });
}

/** The range of an on-off fault: 1 is the fault, 0 is healthy. */
const ON_OFF: SeverityRange = { min: 1, max: 1, unit: '', label: 'present', healthy: 0 };

/**
 * A fault that scales number parameters of a component down from the drawing's values: the
 * severity is the fraction that remains (1 = healthy).
 */
export function scaledParametersFault(def: {
  id: string;
  label: string;
  appliesTo: readonly string[];
  parameters: readonly string[];
  /** Lowest remaining fraction offered. */
  min: number;
  describe(tag: string, fraction: number): string;
}): FaultType {
  const severity: SeverityRange = { min: def.min, max: 1, unit: '1', label: 'Remaining fraction', healthy: 1, quantity: 'fraction' };
  return componentFault({
    id: def.id,
    label: def.label,
    onOff: false,
    severity,
    appliesTo: (component) => def.appliesTo.includes(component.type),
    severityFor: () => severity,
    applyTo: (document, component, fraction) =>
      withParameters(document, component, Object.fromEntries(def.parameters.map((name) => [name, numberParameter(component, name) * fraction]))),
    describe: def.describe,
  });
}

/** A fault that is a component parameter switched to its failed value. */
export function onOffParameterFault(def: {
  id: string;
  label: string;
  appliesTo: (component: CircuitComponent) => boolean;
  parameter: string;
  healthy: string | boolean;
  failed: string | boolean;
  describe(tag: string): string;
}): FaultType {
  return componentFault({
    id: def.id,
    label: def.label,
    onOff: true,
    severity: ON_OFF,
    appliesTo: def.appliesTo,
    severityFor: () => ON_OFF,
    applyTo: (document, component, severity) => withParameters(document, component, { [def.parameter]: severity >= 0.5 ? def.failed : def.healthy }),
    describe: (tag) => def.describe(tag),
  });
}
