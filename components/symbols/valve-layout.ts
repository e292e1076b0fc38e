import type { PortAnchor } from './geometry';

/**
 * Where the parts of a directional control valve symbol sit: one square envelope per
 * switching position side by side, the end marks (actuation, return) beyond the outer
 * envelopes, working ports above and supply and exhausts below the envelope of the rest
 * position, pilot ports at both ends. Shared by the geometry table and the drawing so
 * that the drawn port lines always end on the anchors.
 */

/** Side of one envelope, canvas units. */
export const ENVELOPE = 40;
/** Room for the actuation or return marks at each end of the body. */
const END_ROOM = 20;
/** Pilot line between a pilot port and the body at rest. */
const LEAD = 10;
const HEIGHT = 60;
export const ENVELOPE_TOP = 10;
export const ENVELOPE_BOTTOM = HEIGHT - 10;
export const AXIS_Y = HEIGHT / 2;

/** The engine rests a valve in position 1: "b" of two positions, the centre of three. */
const REST_POSITION = 1;

export interface ValvePositionShape {
  readonly name: string;
  readonly passages: ReadonlyArray<readonly [string, string]>;
}

export interface ValveShape {
  readonly positions: ReadonlyArray<ValvePositionShape>;
  /** Pilot or actuation ports of side a (left) and side b (right). */
  readonly pilotPorts: readonly [string, string];
}

export interface ValveLayout {
  readonly width: number;
  readonly height: number;
  /** Left edge of each envelope with the valve at rest. */
  readonly envelopeX: readonly number[];
  /** Outer ends of the body at rest, where the end marks meet their pilot lines. */
  readonly bodyLeft: number;
  readonly bodyRight: number;
  /** Where the pilot lines towards the body start: the pilot ports, or a timing unit's outlet. */
  readonly leadLeft: number;
  readonly leadRight: number;
  /** Ports joined by passages, each with its offset inside an envelope and the envelope edge it meets. */
  readonly flowPorts: readonly string[];
  readonly column: Readonly<Record<string, number>>;
  readonly edge: Readonly<Record<string, 'top' | 'bottom'>>;
  readonly anchors: Readonly<Record<string, PortAnchor>>;
  readonly restIndex: number;
}

/** ISO 5599-3 numbers working ports even (2, 4) and supply and exhausts odd (1, 3, 5). */
const isWorking = (port: string) => Number(port) % 2 === 0;

/**
 * Columns along an envelope edge, 10 units apart. A 4/2 valve puts its one exhaust under 4,
 * where a 5/2 has 5, so that its rest position draws two parallel paths.
 */
function columnsOf(flowPorts: readonly string[]): Record<string, number> {
  const bottomOrder = flowPorts.includes('5') ? ['5', '1', '3'] : flowPorts.includes('4') ? ['3', '1'] : ['1', '3'];
  const rank = (order: string[], port: string) => (order.includes(port) ? order.indexOf(port) : order.length);
  const spread = (ports: string[]) => ports.map((port, i) => [port, ports.length === 1 ? ENVELOPE / 2 : 10 + (i * 20) / (ports.length - 1)] as const);

  const bottom = flowPorts.filter((p) => !isWorking(p)).sort((a, b) => rank(bottomOrder, a) - rank(bottomOrder, b));
  const top = flowPorts.filter(isWorking).sort((a, b) => rank(['4', '2'], a) - rank(['4', '2'], b));
  const columns: Record<string, number> = Object.fromEntries(spread(bottom));
  // A single working port stands over the supply, so the open path is drawn straight.
  const topColumns = top.length === 1 ? [[top[0]!, columns['1'] ?? ENVELOPE / 2] as const] : spread(top);
  return { ...columns, ...Object.fromEntries(topColumns) };
}

/** `leftRoom` widens the symbol left of the body for a part drawn on the side-a pilot line (a timing unit). */
export function valveLayout(shape: ValveShape, leftRoom = 0): ValveLayout {
  const count = shape.positions.length;
  const width = leftRoom + 2 * (LEAD + END_ROOM) + count * ENVELOPE;
  const bodyLeft = leftRoom + LEAD;
  const envelopeX = shape.positions.map((_, i) => bodyLeft + END_ROOM + i * ENVELOPE);
  const restIndex = Math.min(REST_POSITION, count - 1);
  const flowPorts = [...new Set(shape.positions.flatMap((p) => p.passages.flat()))];
  const column = columnsOf(flowPorts);
  const edge = Object.fromEntries(flowPorts.map((p) => [p, isWorking(p) ? 'top' : 'bottom'] as const));

  const anchors: Record<string, PortAnchor> = {};
  for (const port of flowPorts) {
    const x = envelopeX[restIndex]! + column[port]!;
    anchors[port] = edge[port] === 'top' ? { x, y: 0, side: 'top' } : { x, y: HEIGHT, side: 'bottom' };
  }
  const [sideA, sideB] = shape.pilotPorts;
  anchors[sideA] = { x: 0, y: AXIS_Y, side: 'left' };
  anchors[sideB] = { x: width, y: AXIS_Y, side: 'right' };

  return {
    width,
    height: HEIGHT,
    envelopeX,
    bodyLeft,
    bodyRight: width - LEAD,
    leadLeft: leftRoom,
    leadRight: width,
    flowPorts,
    column,
    edge,
    anchors,
    restIndex,
  };
}

/**
 * How far the body moves so that the envelope of `activePosition` stands under the ports,
 * as ISO 1219-1 shows a switched valve; none at rest or for a position the valve lacks.
 */
export function bodyShift(layout: ValveLayout, activePosition?: number): number {
  if (activePosition === undefined || !Number.isInteger(activePosition)) return 0;
  if (activePosition < 0 || activePosition >= layout.envelopeX.length) return 0;
  return (layout.restIndex - activePosition) * ENVELOPE;
}
