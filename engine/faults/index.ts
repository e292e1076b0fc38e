import type { CircuitDocument } from '../document/schema';
import { pistonSealLeak } from './piston-seal-leak';
import { rodSealLeak } from './rod-seal-leak';
import { sensorFailed } from './sensor-failed';
import { sensorShifted } from './sensor-shifted';
import { silencerClogged } from './silencer-clogged';
import { spoolSticking } from './spool-sticking';
import { spoolStuck } from './spool-stuck';
import { springWeakened } from './spring-weakened';
import { supplyLow } from './supply-low';
import { throttleSetting } from './throttle-setting';
import { tubeLeak } from './tube-leak';
import type { FaultCandidate, FaultSpec, FaultType } from './types';

export type { FaultCandidate, FaultSpec, FaultType, SeverityRange } from './types';

/**
 * The fault library: what can go wrong on a machine, each as a parameter change of the drawing
 * that the engine then simulates as usual. Adding a fault: one file, one line here.
 */
export const FAULT_TYPES: readonly FaultType[] = [
  pistonSealLeak,
  rodSealLeak,
  tubeLeak,
  throttleSetting,
  springWeakened,
  spoolSticking,
  spoolStuck,
  sensorShifted,
  sensorFailed,
  supplyLow,
  silencerClogged,
];

export function faultTypeById(id: string): FaultType | undefined {
  return FAULT_TYPES.find((f) => f.id === id);
}

/** Every fault the drawing could have, on every part it applies to, in library then drawing order. */
export function faultsFor(document: CircuitDocument): FaultCandidate[] {
  return FAULT_TYPES.flatMap((fault) => fault.targets(document).map(({ tag, severity }) => ({ faultId: fault.id, tag, label: `${fault.label}: ${tag}`, severity })));
}

/** A new drawing with one fault; `document` is left as it was. Throws on an unknown fault or a part it does not apply to. */
export function applyFault(document: CircuitDocument, fault: FaultSpec): CircuitDocument {
  const type = faultTypeById(fault.faultId);
  if (!type) throw new Error(`unknown fault "${fault.faultId}"`);
  return type.apply(document, fault.tag, fault.severity);
}

/** A new drawing with several faults, applied in order. */
export function applyFaults(document: CircuitDocument, faults: readonly FaultSpec[]): CircuitDocument {
  return faults.reduce(applyFault, document);
}
