import { GRID, type PortSide } from '@/components/symbols/geometry';

/**
 * How a tube or wire is drawn: a polyline of horizontal and vertical runs that leaves each port
 * straight out along its side, then passes through the bends the engineer placed, in order.
 * Pure geometry in canvas units (y down), so routing and reshaping are tested without a canvas.
 */

export interface Point {
  readonly x: number;
  readonly y: number;
}

/** Where a tube or wire meets its port, and the side of the symbol it leaves by. */
export interface RouteEnd extends Point {
  readonly side: PortSide;
}

export interface RouteEnds {
  readonly source: RouteEnd;
  readonly target: RouteEnd;
}

/** How far a route runs straight out of a port before it may turn: one grid step. */
const STUB = GRID;

const OUTWARD: Readonly<Record<PortSide, Point>> = {
  top: { x: 0, y: -1 },
  right: { x: 1, y: 0 },
  bottom: { x: 0, y: 1 },
  left: { x: -1, y: 0 },
};

const snap = (value: number) => Math.round(value / GRID) * GRID;
const snapPoint = (p: Point): Point => ({ x: snap(p.x), y: snap(p.y) });

// Handle positions measured at a zoom other than 100 % carry float noise (99.99999 for 100) that would leave hair-thin jogs.
const settle = (value: number) => Math.round(value * 1000) / 1000;
const settled = (end: RouteEnd): RouteEnd => ({ x: settle(end.x), y: settle(end.y), side: end.side });

/** The point one stub out of a port, on the grid line across its side: where a route may first turn. */
export function stubEnd(end: RouteEnd): Point {
  const out = OUTWARD[end.side];
  return out.x !== 0 ? { x: snap(settle(end.x) + out.x * STUB), y: settle(end.y) } : { x: settle(end.x), y: snap(settle(end.y) + out.y * STUB) };
}

/**
 * The route from source to target through the bends, as its corner points (first the source,
 * last the target): every run horizontal or vertical, none of length zero, no point between two
 * runs in line. Between two stops it takes the way with no doubling back, then the fewest turns,
 * then the shortest.
 */
export function orthogonalRoute(ends: RouteEnds, bends: readonly Point[]): Point[] {
  const source = settled(ends.source);
  const target = settled(ends.target);
  const path: Point[] = [{ x: source.x, y: source.y }, stubEnd(source)];
  let heading = OUTWARD[source.side];
  const stops = [...bends, stubEnd(target)];
  stops.forEach((stop, i) => {
    const leg = bestLeg(path.at(-1)!, stop, heading, i === stops.length - 1 ? OUTWARD[target.side] : null);
    path.push(...leg.points.slice(1));
    heading = leg.heading;
  });
  path.push({ x: target.x, y: target.y });
  return simplified(path);
}

/** An SVG path through the points. */
export function pathOf(points: readonly Point[]): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'} ${p.x} ${p.y}`).join(' ');
}

/** The point halfway along a route, by length (where a label sits). */
export function midpointOf(route: readonly Point[]): Point {
  let left = lengthOf(route) / 2;
  for (let i = 0; i < route.length - 1; i += 1) {
    const a = route[i]!;
    const b = route[i + 1]!;
    const run = distance(a, b);
    if (left <= run) return run === 0 ? a : { x: a.x + ((b.x - a.x) * left) / run, y: a.y + ((b.y - a.y) * left) / run };
    left -= run;
  }
  return route[0] ?? { x: 0, y: 0 };
}

export interface InnerSegment {
  /** Index of the segment in the route: it runs from point `index` to point `index + 1`. */
  index: number;
  middle: Point;
  horizontal: boolean;
}

/** The runs of a route that touch neither port: the ones that may be dragged sideways. */
export function innerSegments(route: readonly Point[]): InnerSegment[] {
  const inner: InnerSegment[] = [];
  for (let index = 1; index < route.length - 2; index += 1) {
    const a = route[index]!;
    const b = route[index + 1]!;
    inner.push({ index, middle: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 }, horizontal: a.y === b.y });
  }
  return inner;
}

/**
 * The bends that draw the route with one inner run moved across itself to the grid line nearest
 * `towards` (a horizontal run moves up or down, a vertical one left or right). A run next to a
 * port's stub may lengthen the stub, never shorten it. Returns the fewest bends that give that
 * route; the same bends when the run does not move or touches a port.
 */
export function moveSegment(ends: RouteEnds, bends: readonly Point[], index: number, towards: Point): readonly Point[] {
  const route = orthogonalRoute(ends, bends);
  if (index < 1 || index > route.length - 3) return bends;
  const a = route[index]!;
  const horizontal = a.y === route[index + 1]!.y;
  const axis = horizontal ? 'y' : 'x';
  let value = snap(towards[axis]);
  if (index === 1) value = beyondStub(value, ends.source, axis);
  if (index === route.length - 3) value = beyondStub(value, ends.target, axis);
  if (value === a[axis]) return bends;
  const moved = route.map((p, i) => (i === index || i === index + 1 ? { ...p, [axis]: value } : p));
  return fewestBends(ends, moved.slice(1, -1));
}

/** The bends with one moved to the grid point nearest `to`. */
export function moveBend(bends: readonly Point[], index: number, to: Point): readonly Point[] {
  return bends.map((b, i) => (i === index ? snapPoint(to) : b));
}

export function removeBend(bends: readonly Point[], index: number): readonly Point[] {
  return bends.filter((_, i) => i !== index);
}

/**
 * The bends with a new one on the route where it passes nearest `at` (on the grid, outside the
 * stubs), placed in the list where the route reaches it. The same bends when there is no room
 * or a bend is already there.
 */
export function addBend(ends: RouteEnds, bends: readonly Point[], at: Point): readonly Point[] {
  const route = orthogonalRoute(ends, bends);
  const start = stubEnd(ends.source);
  const finish = stubEnd(ends.target);
  let best: { point: Point; arc: number; off: number } | null = null;
  let arcBefore = 0;
  for (let i = 0; i < route.length - 1; i += 1) {
    const a = i === 0 ? start : route[i]!;
    const b = i === route.length - 2 ? finish : route[i + 1]!;
    const axis = a.y === b.y ? 'x' : 'y';
    const lo = Math.min(a[axis], b[axis]);
    const hi = Math.max(a[axis], b[axis]);
    const whole = directionOf(route[i]!, route[i + 1]!);
    const usable = directionOf(a, b);
    // Ports closer than two stubs leave nothing of the run between them to put a bend on.
    if ((usable.x === whole.x && usable.y === whole.y) || (usable.x === 0 && usable.y === 0)) {
      const along = Math.min(hi, Math.max(lo, snap(at[axis])));
      const point = axis === 'x' ? { x: along, y: a.y } : { x: a.x, y: along };
      const off = distance(point, at);
      if (!best || off < best.off) best = { point, arc: arcBefore + distance(route[i]!, point), off };
    }
    arcBefore += distance(route[i]!, route[i + 1]!);
  }
  if (!best || bends.some((b) => b.x === best.point.x && b.y === best.point.y)) return bends;
  let from = 0;
  let slot = bends.length;
  for (let i = 0; i < bends.length; i += 1) {
    from = arcNearest(route, bends[i]!, from);
    if (from > best.arc) {
      slot = i;
      break;
    }
  }
  return [...bends.slice(0, slot), best.point, ...bends.slice(slot)];
}

type Heading = Point;

/** The corners between two stops: the candidate with no doubling back, then fewest turns, then shortest. */
function bestLeg(from: Point, to: Point, heading: Heading, away: Heading | null): { points: Point[]; heading: Heading } {
  const midX = snap((from.x + to.x) / 2);
  const midY = snap((from.y + to.y) / 2);
  const detour = 2 * GRID;
  const rowAt = (y: number) => [{ x: from.x, y }, { x: to.x, y }];
  const columnAt = (x: number) => [{ x, y: from.y }, { x, y: to.y }];
  const vertical = heading.x === 0;
  // Order breaks ties: straight, then a crossing midway, then an L that keeps on before it turns.
  const candidates: Point[][] = [
    ...(from.x === to.x || from.y === to.y ? [[]] : []),
    vertical ? rowAt(midY) : columnAt(midX),
    vertical ? columnAt(midX) : rowAt(midY),
    [vertical ? { x: from.x, y: to.y } : { x: to.x, y: from.y }],
    [vertical ? { x: to.x, y: from.y } : { x: from.x, y: to.y }],
    // Side steps for a stop straight behind: the way out when every direct way doubles back.
    columnAt(from.x + detour),
    columnAt(from.x - detour),
    rowAt(from.y + detour),
    rowAt(from.y - detour),
  ];
  let best: { points: Point[]; heading: Heading; cost: number[] } | null = null;
  for (const corners of candidates) {
    const points = withoutRepeats([from, ...corners, to]);
    const scored = costOf(points, heading, away);
    if (!best || lexicallyLess(scored.cost, best.cost)) best = { points, ...scored };
  }
  return best!;
}

/**
 * Doubling back (a run reversing the one before it, or arriving at a port's stub going away from
 * the port) weighs most, then turns, then length. `away` is the port's outward direction.
 */
function costOf(points: readonly Point[], heading: Heading, away: Heading | null): { heading: Heading; cost: number[] } {
  let reversals = 0;
  let turns = 0;
  let length = 0;
  let now = heading;
  for (let i = 0; i < points.length - 1; i += 1) {
    const next = directionOf(points[i]!, points[i + 1]!);
    if (next.x === -now.x && next.y === -now.y) reversals += 1;
    else if (next.x !== now.x || next.y !== now.y) turns += 1;
    now = next;
    length += distance(points[i]!, points[i + 1]!);
  }
  if (away) {
    if (now.x === away.x && now.y === away.y) reversals += 1;
    else if (now.x !== -away.x || now.y !== -away.y) turns += 1;
  }
  return { heading: now, cost: [reversals, turns, length] };
}

function lexicallyLess(a: readonly number[], b: readonly number[]): boolean {
  for (let i = 0; i < a.length; i += 1) if (a[i] !== b[i]) return a[i]! < b[i]!;
  return false;
}

function directionOf(a: Point, b: Point): Heading {
  return { x: Math.sign(b.x - a.x), y: Math.sign(b.y - a.y) };
}

function withoutRepeats(points: readonly Point[]): Point[] {
  return points.filter((p, i) => i === 0 || p.x !== points[i - 1]!.x || p.y !== points[i - 1]!.y);
}

function inLine(a: Point, b: Point, c: Point): boolean {
  return (a.x === b.x && b.x === c.x) || (a.y === b.y && b.y === c.y);
}

/** Drops repeated points and every point between two runs in line (a straight-on point or the tip of a spike). */
function simplified(points: readonly Point[]): Point[] {
  const out: Point[] = [];
  for (const p of points) {
    while (out.length >= 2 && inLine(out.at(-2)!, out.at(-1)!, p)) out.pop();
    const last = out.at(-1);
    if (!last || last.x !== p.x || last.y !== p.y) out.push(p);
  }
  return out;
}

/** `value` held on the far side of the port's stub end along `axis`, if the stub runs along it. */
function beyondStub(value: number, end: RouteEnd, axis: 'x' | 'y'): number {
  const out = OUTWARD[end.side][axis];
  const limit = stubEnd(end)[axis];
  return out > 0 ? Math.max(value, limit) : out < 0 ? Math.min(value, limit) : value;
}

/** The given bends less each one, last to first, that the same route can do without. */
function fewestBends(ends: RouteEnds, bends: readonly Point[]): readonly Point[] {
  const goal = pathOf(orthogonalRoute(ends, bends));
  let kept = bends;
  for (let i = kept.length - 1; i >= 0; i -= 1) {
    const without = removeBend(kept, i);
    if (pathOf(orthogonalRoute(ends, without)) === goal) kept = without;
  }
  return kept;
}

/** How far along the route (by length, at or after `from`) it passes nearest the point. */
function arcNearest(route: readonly Point[], point: Point, from: number): number {
  let best = { arc: from, off: Infinity };
  let arcBefore = 0;
  for (let i = 0; i < route.length - 1; i += 1) {
    const a = route[i]!;
    const b = route[i + 1]!;
    const run = distance(a, b);
    const t = run === 0 ? 0 : Math.min(1, Math.max(0, ((point.x - a.x) * (b.x - a.x) + (point.y - a.y) * (b.y - a.y)) / (run * run)));
    const arc = Math.max(from, arcBefore + t * run);
    if (arc <= arcBefore + run) {
      const s = (arc - arcBefore) / (run || 1);
      const off = distance({ x: a.x + (b.x - a.x) * s, y: a.y + (b.y - a.y) * s }, point);
      if (off < best.off) best = { arc, off };
    }
    arcBefore += run;
  }
  return best.arc;
}

function distance(a: Point, b: Point): number {
  return Math.abs(a.x - b.x) + Math.abs(a.y - b.y);
}

function lengthOf(route: readonly Point[]): number {
  return route.slice(1).reduce((sum, p, i) => sum + distance(route[i]!, p), 0);
}
