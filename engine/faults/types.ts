import type { Quantity } from '../components/types';
import type { CircuitComponent, CircuitDocument } from '../document/schema';

/**
 * How bad a fault is, as the value of the parameter it changes on the machine. SI units
 * (`unit` names them); `quantity` lets a page show it in its own units. `healthy` is the value
 * the drawing has: applying it gives the unfaulted circuit.
 */
export interface SeverityRange {
  min: number;
  max: number;
  unit: string;
  label: string;
  healthy: number;
  quantity?: Quantity;
}

/** One fault on one part: the part's tag (a tube's id for a tube leak) and how bad it is. */
export interface FaultSpec {
  faultId: string;
  tag: string;
  severity: number;
}

/** A fault that a drawing could have, with the range its severity can take on that part. */
export interface FaultCandidate {
  faultId: string;
  tag: string;
  label: string;
  severity: SeverityRange;
}

export interface FaultType {
  readonly id: string;
  readonly label: string;
  /** Present or absent, nothing between (a stuck spool): severity 1 is the fault, 0 is healthy, and min = max = 1. */
  readonly onOff: boolean;
  /** The range when nothing on the part says otherwise. */
  readonly severity: SeverityRange;
  /** Whether it can happen on this component (false for every component when it happens on tubes). */
  appliesTo(component: CircuitComponent, document: CircuitDocument): boolean;
  /** The parts of a drawing it can happen on, each with its range (healthy = what the drawing sets there). */
  targets(document: CircuitDocument): Array<{ tag: string; severity: SeverityRange }>;
  /** The drawing with the fault at this severity on the part; never changes `document`. */
  apply(document: CircuitDocument, tag: string, severity: number): CircuitDocument;
  /** One plain sentence, in the units a technician reads (bar gauge, mm, ms, %). */
  describe(tag: string, severity: number): string;
}
