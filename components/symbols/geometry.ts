import { componentTypeById } from '@/engine/components/registry';
import type { ComponentType } from '@/engine/components/types';
import { valveLayout } from './valve-layout';

/**
 * The box and port anchors of every component type's symbol, in the symbol's own canvas
 * units (y grows downwards). Boxes and anchors sit on a 10-unit grid so that tubes and wires
 * drawn between symbols run straight. Energy flows upwards as on a circuit drawing: supply
 * and exhausts below, working ports above; electrical current paths run top to bottom.
 */

export type PortSide = 'top' | 'right' | 'bottom' | 'left';

export interface PortAnchor {
  readonly x: number;
  readonly y: number;
  /** The box edge the anchor lies on, which is also the way a tube or wire leaves it. */
  readonly side: PortSide;
}

export interface SymbolGeometry {
  readonly width: number;
  readonly height: number;
  readonly ports: Readonly<Record<string, PortAnchor>>;
}

/** The drawing grid in canvas units: symbol boxes, anchors and component positions sit on it. */
export const GRID = 10;

/** Room a timing unit (throttle, check valve, reservoir) takes left of a time-delay valve. */
export const TIMER_ROOM = 50;

const top = (x: number): PortAnchor => ({ x, y: 0, side: 'top' });
const bottom = (x: number, height: number): PortAnchor => ({ x, y: height, side: 'bottom' });
const left = (y: number): PortAnchor => ({ x: 0, y, side: 'left' });

/** A part in a line drawn upright: outlet above, inlet below. */
const inline = (width: number, height: number, outlet: string, inlet: string): SymbolGeometry => ({
  width,
  height,
  ports: { [outlet]: top(width / 2), [inlet]: bottom(width / 2, height) },
});

/** A contact, coil or lamp in a vertical current path: first terminal above, second below. */
export function contactGeometry(upper: string, lower: string): SymbolGeometry {
  return { width: 60, height: 60, ports: { [upper]: top(40), [lower]: bottom(40, 60) } };
}

const twoTerminal = (type: ComponentType, width = 60): SymbolGeometry => {
  const [upper, lower] = type.ports;
  return inline(width, 60, upper!.id, lower!.id);
};

const valve = (type: ComponentType, leftRoom = 0): SymbolGeometry => {
  if (!type.positions || !type.pilotPorts) return genericGeometry(type.ports.map((p) => p.id));
  const layout = valveLayout({ positions: type.positions, pilotPorts: type.pilotPorts }, leftRoom);
  return { width: layout.width, height: layout.height, ports: layout.anchors };
};

const logicValve: SymbolGeometry = { width: 80, height: 50, ports: { '1.1': bottom(10, 50), '1.2': bottom(70, 50), '2': top(40) } };

/** Changeover contact: common 11 below, 12 (opens) and 14 (closes) above; `shift` leaves room for an operator. */
const changeover = (width: number, shift: number, extra: Record<string, PortAnchor> = {}): SymbolGeometry => ({
  width,
  height: 60,
  ports: { '12': top(30 + shift), '14': top(50 + shift), '11': bottom(40 + shift, 60), ...extra },
});

const sensor: SymbolGeometry = { width: 60, height: 60, ports: { BN: top(30), BK: bottom(20, 60), BU: bottom(40, 60) } };

const cylinder = (type: ComponentType): SymbolGeometry => {
  const ends: Record<string, PortAnchor> = { A: bottom(30, 50), B: bottom(110, 50) };
  return { width: 160, height: 50, ports: Object.fromEntries(type.ports.map((p) => [p.id, ends[p.id]!])) };
};

const LAYOUTS: Readonly<Record<string, (type: ComponentType) => SymbolGeometry>> = {
  'air-supply': () => ({ width: 60, height: 50, ports: { '2': top(30) } }),
  filter: () => inline(60, 60, '2', '1'),
  'pressure-regulator': () => ({ width: 80, height: 60, ports: { '2': top(30), '1': bottom(30, 60), '3': bottom(50, 60) } }),
  lubricator: () => inline(60, 60, '2', '1'),
  'shut-off-valve': (type) => valve(type),
  reservoir: () => ({ width: 80, height: 50, ports: { '1': bottom(40, 50) } }),
  silencer: () => ({ width: 40, height: 40, ports: { '1': top(20) } }),
  'pressure-gauge': () => ({ width: 60, height: 50, ports: { '1': bottom(30, 50) } }),
  'valve-2-2': (type) => valve(type),
  'valve-3-2-nc': (type) => valve(type),
  'valve-3-2-no': (type) => valve(type),
  'valve-4-2': (type) => valve(type),
  'valve-5-2': (type) => valve(type),
  'valve-5-3-closed': (type) => valve(type),
  'valve-5-3-exhausted': (type) => valve(type),
  'valve-5-3-pressurised': (type) => valve(type),
  'two-pressure-valve': () => logicValve,
  'shuttle-valve': () => logicValve,
  'check-valve': () => inline(40, 60, '2', '1'),
  throttle: () => inline(40, 60, '2', '1'),
  'one-way-flow-control': () => inline(80, 70, '2', '1'),
  'quick-exhaust-valve': () => ({ width: 80, height: 50, ports: { '1': bottom(10, 50), '3': bottom(70, 50), '2': top(40) } }),
  'pressure-sequence-valve': (type) => valve(type),
  'time-delay-valve-nc': (type) => valve(type, TIMER_ROOM),
  'time-delay-valve-no': (type) => valve(type, TIMER_ROOM),
  'cylinder-single-acting': cylinder,
  'cylinder-double-acting': cylinder,
  'semi-rotary-actuator': () => ({ width: 80, height: 50, ports: { A: bottom(30, 50), B: bottom(50, 50) } }),
  'dc-supply': (type) => twoTerminal(type),
  'pushbutton-no': (type) => contactGeometry(type.ports[0]!.id, type.ports[1]!.id),
  'pushbutton-nc': (type) => contactGeometry(type.ports[0]!.id, type.ports[1]!.id),
  'selector-switch': (type) => contactGeometry(type.ports[0]!.id, type.ports[1]!.id),
  'emergency-stop': (type) => contactGeometry(type.ports[0]!.id, type.ports[1]!.id),
  'limit-switch': () => changeover(60, 0),
  'proximity-sensor-reed': () => sensor,
  'proximity-sensor-inductive': () => sensor,
  'pressure-switch': () => changeover(70, 10, { '1': left(30) }),
  'relay-coil': (type) => twoTerminal(type),
  'timer-relay-on-delay': (type) => twoTerminal(type),
  'timer-relay-off-delay': (type) => twoTerminal(type),
  counter: () => ({ width: 80, height: 60, ports: { A1: top(20), A2: bottom(20, 60), R1: top(60), R2: bottom(60, 60) } }),
  'relay-contact-no': (type) => contactGeometry(type.ports[0]!.id, type.ports[1]!.id),
  'relay-contact-nc': (type) => contactGeometry(type.ports[0]!.id, type.ports[1]!.id),
  'solenoid-coil': (type) => twoTerminal(type),
  'indicator-lamp': (type) => twoTerminal(type),
  diode: (type) => twoTerminal(type, 40),
};

/**
 * A plain box with the ports taken in turn along its top and bottom edges, for a type that
 * has no symbol of its own (or is unknown), so the canvas can still place and wire it.
 */
export function genericGeometry(portIds: readonly string[]): SymbolGeometry {
  const upper = portIds.filter((_, i) => i % 2 === 0);
  const lower = portIds.filter((_, i) => i % 2 === 1);
  const width = Math.max(60, 20 * (upper.length + 1));
  const height = 60;
  return {
    width,
    height,
    ports: Object.fromEntries([
      ...upper.map((id, i) => [id, top(20 + 20 * i)] as const),
      ...lower.map((id, i) => [id, bottom(20 + 20 * i, height)] as const),
    ]),
  };
}

// The canvas asks once per node and render; a registry type's geometry never changes.
const known = new Map<string, SymbolGeometry>();

/**
 * The symbol's box and port anchors for a component type. Never throws: an id missing from
 * the registry gets the generic box, with `portIds` (the ports tubes and wires name) on it.
 */
export function symbolGeometry(typeId: string, portIds: readonly string[] = []): SymbolGeometry {
  const type = componentTypeById(typeId);
  if (!type) return genericGeometry(portIds);
  let geometry = known.get(typeId);
  if (!geometry) {
    const layout = Object.hasOwn(LAYOUTS, typeId) ? LAYOUTS[typeId] : undefined;
    geometry = layout ? layout(type) : genericGeometry(type.ports.map((p) => p.id));
    known.set(typeId, geometry);
  }
  return geometry;
}
