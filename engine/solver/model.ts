import type { Behaviour, PistonSpec, RestrictionSpec } from '../components/types';

/** A pneumatic node: ports joined by tubes, plus internal volumes and piston chambers. */
export interface NodeModel {
  name: string;
  /** Fixed volume (ports, tubes, internal volumes), m³. */
  volumeM3: number;
  /** Boundary nodes hold their pressure (atmosphere, ideal supplies). */
  fixed: boolean;
  fixedPressurePa: number;
  /** Component that holds this boundary's pressure (an ideal supply) and may change it while running. */
  holder?: string;
  /** Chambers whose volume follows a piston: V += area·(x or stroke − x) + dead volume. */
  chambers: Array<{ piston: number; side: 'cap' | 'rod' }>;
  /**
   * Polytropic exponent n of the gas in this node (1 = isothermal, 1.4 = adiabatic);
   * absent means 1. The pressure follows p = p_amb·(ρ/ρ_amb)^n with ρ_amb the density of
   * air at ambient pressure and temperature, so that dp/dt = n·p/m·ṁ − n·p/V·V̇.
   */
  polytropicExponent?: number;
}

export interface RestrictionModel extends Omit<RestrictionSpec, 'from' | 'to' | 'modulator'> {
  from: number;
  to: number;
  owner: string;
  opening: number;
  modulator?: { control: number; fn: (pressurePa: number) => { k: number; dk: number } };
}

export interface PistonModel extends Omit<PistonSpec, 'capNode' | 'rodNode'> {
  owner: string;
  capNode: number;
  rodNode: number | null;
}

export interface BehaviourEntry {
  componentId: string;
  tag: string;
  behaviour: Behaviour;
}

/** Severity and stable code of a problem found while compiling a document. */
export interface Diagnostic {
  code: string;
  severity: 'error' | 'warning';
  message: string;
  componentId?: string;
  tubeId?: string;
  wireId?: string;
}

/** Everything the solver needs, built once from a document. */
export interface SolverModel {
  ambientPa: number;
  temperatureK: number;
  nodes: NodeModel[];
  restrictions: RestrictionModel[];
  pistons: PistonModel[];
  behaviours: BehaviourEntry[];
  /** Trace name → node index for every connected or internal port. */
  portNodes: Array<{ signal: string; node: number }>;
  /** Component id and tag lookup, for inputs given by either. */
  componentIds: Map<string, number>;
  /** The electrical control network: the owners of contacts that changed since last asked, and which nets carry + potential. */
  control: { drainChanged(): string[]; netLive(net: number): boolean };
  /** The net each wire belongs to, for showing which wires are live. */
  wireNets: Array<{ wireId: string; net: number }>;
}
