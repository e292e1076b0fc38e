/**
 * The contract between a component type (one file in this folder) and the solver.
 * A type declares its ports and parameters as data, and builds its runtime
 * behaviour from a small set of solver primitives (nodes, restrictions, pistons,
 * guards, timers). Units are SI: pressures in Pa, lengths in m, times in s.
 */

export const CATEGORIES = ['supply', 'input', 'logic', 'final-valve', 'actuator', 'measurement', 'electrical'] as const;
export type Category = (typeof CATEGORIES)[number];

/** Physical meaning of a number parameter; the UI converts and labels by it. */
export type Quantity =
  | 'pressure-gauge' // Pa above ambient (set points)
  | 'pressure-difference' // Pa (cracking, hysteresis)
  | 'length' // m
  | 'volume' // m³
  | 'time' // s
  | 'mass' // kg
  | 'force' // N
  | 'torque' // N·m
  | 'stiffness' // N/m
  | 'inertia' // kg·m²
  | 'volume-per-angle' // m³/rad
  | 'damping' // N·s/m
  | 'conductance' // m³/(s·Pa), ISO 6358 sonic conductance C
  | 'ratio' // dimensionless (critical ratio b, polytropic exponent)
  | 'fraction' // 0..1 (throttle opening)
  | 'volume-flow-anr' // m³/s at ISO 8778 reference atmosphere
  | 'angle' // rad
  | 'voltage' // V
  | 'count'; // whole number of events

export type ParameterSpec =
  | { kind: 'number'; quantity: Quantity; label: string; default: number; min: number; max: number; description?: string }
  | { kind: 'choice'; label: string; options: readonly string[]; default: string; description?: string }
  | { kind: 'flag'; label: string; default: boolean; description?: string }
  /** The tag of another component in the same circuit (the relay a contact belongs to, the valve a coil drives). */
  | { kind: 'tag'; label: string; default: string; refers: 'coil' | 'valve'; description?: string };

/** Air ports are joined by tubes; electrical terminals (role `terminal`) by wires. */
export type PortRole = 'supply' | 'working' | 'exhaust' | 'pilot' | 'signal' | 'terminal';

export interface PortSpec {
  /** Port number as ISO 11727 / ISO 5599-3 give it ("1", "2", "14"), or a letter where the trade uses one. */
  id: string;
  role: PortRole;
  /** Shown beside the port; defaults to the id. */
  label?: string;
}

export type ParameterValues = Readonly<Record<string, number | string | boolean>>;

/** Handles handed out by the build context. */
export type NodeRef = { readonly node: number };
export type RestrictionRef = { readonly restriction: number };
export type PistonRef = { readonly piston: number };

export interface RestrictionSpec {
  name: string;
  from: NodeRef;
  to: NodeRef;
  /** ISO 6358 sonic conductance C, m³/(s·Pa). */
  conductance: number;
  /** ISO 6358 critical pressure ratio b. */
  criticalRatio: number;
  /** Only from → to (a check valve) when true. */
  oneWay?: boolean;
  /** For one-way passages: pressure difference needed to open, Pa. */
  crackingPa?: number;
  /** Opening 0..1 at start. */
  opening?: number;
  /**
   * Continuous opening as a function of one node's pressure (regulators).
   * Returns the opening and its derivative with respect to that pressure.
   */
  modulator?: { control: NodeRef; fn: (pressurePa: number) => { k: number; dk: number } };
}

export interface PistonSpec {
  name: string;
  /** Chamber whose gas pushes towards extension (cap side). */
  capNode: NodeRef;
  /** Effective area on the cap side, m². */
  capArea: number;
  /** Chamber on the rod side, or null when that side is open to atmosphere. */
  rodNode: NodeRef | null;
  rodSideArea: number;
  /** Area that sees ambient pressure against extension (rod cross-section on a single-rod cylinder), m². */
  ambientArea: number;
  strokeM: number;
  deadVolumeCapM3: number;
  deadVolumeRodM3: number;
  movingMassKg: number;
  /** External load opposing extension, N (negative pulls). */
  loadN: number;
  coulombN: number;
  breakawayN: number;
  viscousNsPerM: number;
  /** Spring force at x = 0 and rate, pushing towards retraction (single-acting). */
  springPreloadN: number;
  springRateNPerM: number;
  startPositionM: number;
  /** Polytropic exponent of the gas in the chambers (1 = isothermal, default; 1.4 = adiabatic). */
  polytropicExponent?: number;
}

/** What a behaviour can read and do while the simulation runs. */
export interface RuntimeApi {
  readonly time: number;
  pressure(node: NodeRef): number;
  ambientPa(): number;
  position(piston: PistonRef): number;
  velocity(piston: PistonRef): number;
  setOpening(restriction: RestrictionRef, opening: number): void;
  setFixedPressure(node: NodeRef, pressurePa: number): void;
  /** Calls onTimer(tag) after delay seconds (delay ≥ 0). */
  schedule(delayS: number, tag: string): void;
  cancel(tag: string): void;
  event(kind: string, detail?: string): void;
  /**
   * Gives another component (by id or tag) an input after delay seconds (0: at this instant,
   * after what is already due): a coil driving its valve, a circuit waking a relay.
   */
  send(target: string, command: InputCommand, delayS?: number): void;
}

export type InputAction = 'press' | 'release' | 'toggle' | 'set';

export interface InputCommand {
  action: InputAction;
  parameter?: string;
  value?: number;
}

/**
 * How a person works a part by hand on a running drawing: held while pressed, switched over at
 * each push (detent, latching selector), or struck and later reset (an emergency stop).
 */
export type HandOperation = 'hold' | 'switch' | 'strike';

/** The running behaviour of one placed component. All methods are optional. */
export interface Behaviour {
  /**
   * Continuous functions of the state whose zero crossings are events (located in time). Called
   * at every accepted step: the same array may come back each time, as the caller copies the
   * values at once (and their number must not change between discrete events).
   */
  guards?(api: RuntimeApi): readonly number[];
  onGuard?(index: number, rising: boolean, api: RuntimeApi): void;
  onTimer?(tag: string, api: RuntimeApi): void;
  onInput?(command: InputCommand, api: RuntimeApi): void;
  /** Runs once at t = 0 after every component is built. */
  start?(api: RuntimeApi): void;
  /**
   * Discrete signals for the trace (valve position index, actuated flags). They change only in
   * the behaviour's own callbacks, or (for a contact) when the control network switches it.
   */
  signals?(): Record<string, number>;
}

export interface ActuationLink {
  piston: PistonRef;
  positionM: number;
}

export interface BuildContext {
  readonly componentId: string;
  readonly tag: string;
  readonly parameters: ParameterValues;
  num(name: string): number;
  choice(name: string): string;
  flag(name: string): boolean;
  /** The pneumatic node a port belongs to (ports joined by tubes share one). */
  port(id: string): NodeRef;
  /** True when a tube is attached to the port. */
  connected(id: string): boolean;
  internalNode(name: string, volumeM3: number): NodeRef;
  atmosphere(): NodeRef;
  fixedPressure(name: string, pressurePa: number): NodeRef;
  /** Holds a port's node at a pressure (an ideal source): the node becomes a boundary. */
  holdPort(id: string, pressurePa: number): NodeRef;
  addVolume(node: NodeRef, volumeM3: number): void;
  restriction(spec: RestrictionSpec): RestrictionRef;
  piston(spec: PistonSpec): PistonRef;
  /** The control-circuit net of an electrical terminal (terminals joined by wires share one). */
  terminal(id: string): number;
  /** The circuit's one electrical control network, shared by every electrical component. */
  control(): ControlNetwork;
  /** Position links that actuate this component (roller valves, sensors). */
  actuationLinks(): ActuationLink[];
  ambientPa(): number;
}

export interface ComponentType {
  /** Stable id stored in documents. Never rename. */
  readonly id: string;
  readonly version: number;
  readonly label: string;
  readonly category: Category;
  readonly description: string;
  readonly ports: readonly PortSpec[];
  readonly parameters: Readonly<Record<string, ParameterSpec>>;
  /** Discrete states the type can be in (valve positions, logic states), for symbols and the trace. */
  readonly states: readonly string[];
  /**
   * Directional control valves: the port pairs joined in each switching position, in the order
   * of `states` (every other port blocked there), for the drawn envelopes.
   */
  readonly positions?: ReadonlyArray<{ readonly name: string; readonly passages: ReadonlyArray<readonly [string, string]> }>;
  /** Directional control valves: the pilot or actuation ports of side a and side b (14/12, 12/10). */
  readonly pilotPorts?: readonly [string, string];
  /** Manual inputs a user can give on the drawing. */
  readonly inputs?: readonly InputAction[];
  /** How a person works it by hand, given its parameters with the defaults filled in; absent or null: not by hand. */
  handOperation?(parameters: ParameterValues): HandOperation | null;
  build(ctx: BuildContext): Behaviour;
}

/** What an electrical component registers with the control network (implemented in ../solver/control-network.ts). */
export interface ControlNetwork {
  /** The + (L+) and 0 V (M) rails of a DC supply; returns its index. */
  addSupply(plusNet: number, zeroNet: number): number;
  /** Switches a supply's output off (loss of control power) or on again, then settles the network. */
  setSupplyPowered(supply: number, powered: boolean, api: RuntimeApi): void;
  /** A switching element between two nets; returns its index. `coil` names the coil it follows, if any. */
  addContact(a: number, b: number, closed: boolean, owner: string, coil?: string): number;
  /** A one-way element (a diode), conducting from anode to cathode only. */
  addDiode(anode: number, cathode: number, owner: string): void;
  /** A load between two nets (coil, lamp); `owner` gets `set` inputs (value 1 or 0) as it is energised or not. */
  addLoad(a: number, b: number, owner: string, name?: string): void;
  /** Switches contacts together (a changeover), then settles the network once. */
  setContacts(changes: ReadonlyArray<readonly [contact: number, closed: boolean]>, api: RuntimeApi): void;
  /** Switches every contact that follows `coil`: normally-open ones close when `operated`. */
  operateContacts(coil: string, operated: boolean, api: RuntimeApi): void;
  contactClosed(contact: number): boolean;
  /** Recomputes which loads are energised and tells the owners of those that changed. */
  settle(api: RuntimeApi): void;
}

/** Reads a parameter with the type's default. */
export function parameterDefaults(type: ComponentType): Record<string, number | string | boolean> {
  return Object.fromEntries(Object.entries(type.parameters).map(([k, spec]) => [k, spec.default]));
}
