import { describe, expect, it } from 'vitest';
import {
  addBend,
  innerSegments,
  midpointOf,
  moveBend,
  moveSegment,
  orthogonalRoute,
  pathOf,
  removeBend,
  stubEnd,
  type Point,
  type RouteEnd,
  type RouteEnds,
} from '@/components/editor/orthogonal-route';
import type { PortSide } from '@/components/symbols/geometry';

const end = (x: number, y: number, side: PortSide): RouteEnd => ({ x, y, side });

/** A valve's top port at (0, 100) to a cylinder's bottom port at (100, 0), up and to the right. */
const upward: RouteEnds = { source: end(0, 100, 'top'), target: end(100, 0, 'bottom') };

describe('routing', () => {
  it('runs straight between a bottom port and the top port right below it', () => {
    expect(orthogonalRoute({ source: end(100, 100, 'bottom'), target: end(100, 200, 'top') }, [])).toEqual([
      { x: 100, y: 100 },
      { x: 100, y: 200 },
    ]);
  });

  it('runs straight up from a top port to the bottom port right above it, starting at the handles’ edges', () => {
    // The canvas gives the outer edge of a 9-unit handle, 4.5 beyond the anchor.
    expect(orthogonalRoute({ source: end(40, 195.5, 'top'), target: end(40, 64.5, 'bottom') }, [])).toEqual([
      { x: 40, y: 195.5 },
      { x: 40, y: 64.5 },
    ]);
  });

  it('turns once from a side port into a top port below and to the side (an L)', () => {
    expect(orthogonalRoute({ source: end(0, 0, 'right'), target: end(100, 50, 'top') }, [])).toEqual([
      { x: 0, y: 0 },
      { x: 100, y: 0 },
      { x: 100, y: 50 },
    ]);
  });

  it('crosses over midway between two ports that face the same way (a Z)', () => {
    expect(orthogonalRoute(upward, [])).toEqual([
      { x: 0, y: 100 },
      { x: 0, y: 50 },
      { x: 100, y: 50 },
      { x: 100, y: 0 },
    ]);
    expect(orthogonalRoute({ source: end(0, 0, 'right'), target: end(100, 50, 'left') }, [])).toEqual([
      { x: 0, y: 0 },
      { x: 50, y: 0 },
      { x: 50, y: 50 },
      { x: 100, y: 50 },
    ]);
  });

  it('goes round to reach a port that faces away, never back along its own stub', () => {
    expect(orthogonalRoute({ source: end(0, 0, 'top'), target: end(100, 100, 'bottom') }, [])).toEqual([
      { x: 0, y: 0 },
      { x: 0, y: -10 },
      { x: 50, y: -10 },
      { x: 50, y: 110 },
      { x: 100, y: 110 },
      { x: 100, y: 100 },
    ]);
    expect(orthogonalRoute({ source: end(0, 0, 'top'), target: end(0, 100, 'bottom') }, [])).toEqual([
      { x: 0, y: 0 },
      { x: 0, y: -10 },
      { x: 20, y: -10 },
      { x: 20, y: 110 },
      { x: 0, y: 110 },
      { x: 0, y: 100 },
    ]);
  });

  it('passes through two bends in order', () => {
    const ends: RouteEnds = { source: end(0, 100, 'top'), target: end(200, 0, 'bottom') };
    expect(orthogonalRoute(ends, [{ x: 50, y: 60 }, { x: 150, y: 40 }])).toEqual([
      { x: 0, y: 100 },
      { x: 0, y: 60 },
      { x: 150, y: 60 },
      { x: 150, y: 30 },
      { x: 200, y: 30 },
      { x: 200, y: 0 },
    ]);
    // The other order makes the route come back on itself to reach the first bend.
    expect(orthogonalRoute(ends, [{ x: 150, y: 40 }, { x: 50, y: 60 }])).toEqual([
      { x: 0, y: 100 },
      { x: 0, y: 40 },
      { x: 150, y: 40 },
      { x: 150, y: 60 },
      { x: 50, y: 60 },
      { x: 50, y: 40 },
      { x: 200, y: 40 },
      { x: 200, y: 0 },
    ]);
  });

  it('settles the float noise of handles measured at a zoom, so no hair-thin jog appears', () => {
    expect(orthogonalRoute({ source: end(99.99999997, 104.5, 'bottom'), target: end(100.00000002, 195.5, 'top') }, [])).toEqual([
      { x: 100, y: 104.5 },
      { x: 100, y: 195.5 },
    ]);
  });

  it('keeps every run horizontal or vertical and none of length zero, leaves and enters ports along their sides, and passes every bend', () => {
    const sides: PortSide[] = ['top', 'right', 'bottom', 'left'];
    let seed = 12345;
    // A fixed linear congruential sequence keeps the check repeatable.
    const random = () => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    const grid = (span: number) => Math.round((random() * span) / 10) * 10;
    for (let n = 0; n < 500; n += 1) {
      const source = end(grid(400), grid(400) + (random() < 0.5 ? 4.5 : 0), sides[Math.floor(random() * 4)]!);
      const target = end(grid(400), grid(400), sides[Math.floor(random() * 4)]!);
      const bends = Array.from({ length: Math.floor(random() * 4) }, () => ({ x: grid(400), y: grid(400) }));
      const route = orthogonalRoute({ source, target }, bends);
      expect(route[0]).toEqual({ x: source.x, y: source.y });
      expect(route.at(-1)).toEqual({ x: target.x, y: target.y });
      for (let i = 0; i < route.length - 1; i += 1) {
        const [a, b] = [route[i]!, route[i + 1]!];
        expect(a.x === b.x || a.y === b.y, `${JSON.stringify(route)} segment ${i}`).toBe(true);
        expect(a.x === b.x && a.y === b.y, `${JSON.stringify(route)} segment ${i}`).toBe(false);
      }
      expect(direction(route[0]!, route[1]!), JSON.stringify(route)).toEqual(OUT[source.side]);
      expect(direction(route.at(-1)!, route.at(-2)!), JSON.stringify(route)).toEqual(OUT[target.side]);
      for (const bend of bends) expect(onRoute(route, bend), `${JSON.stringify(route)} misses ${JSON.stringify(bend)}`).toBe(true);
    }
  });
});

describe('reading a route', () => {
  const route = orthogonalRoute(upward, []);

  it('writes it as an SVG path', () => {
    expect(pathOf(route)).toBe('M 0 100 L 0 50 L 100 50 L 100 0');
  });

  it('finds the point halfway along it and the runs that touch no port', () => {
    expect(midpointOf(route)).toEqual({ x: 50, y: 50 });
    expect(innerSegments(route)).toEqual([{ index: 1, middle: { x: 50, y: 50 }, horizontal: true }]);
    expect(innerSegments(orthogonalRoute({ source: end(0, 0, 'right'), target: end(100, 50, 'top') }, []))).toEqual([]);
  });

  it('puts the stub end one grid step out of the port, on the grid line', () => {
    expect(stubEnd(end(40, 195.5, 'top'))).toEqual({ x: 40, y: 190 });
    expect(stubEnd(end(104.5, 30, 'right'))).toEqual({ x: 110, y: 30 });
  });
});

describe('reshaping a route', () => {
  it('moves a run across itself to the nearest grid line, keeping only the bends that route needs', () => {
    const bends = moveSegment(upward, [], 1, { x: 33, y: 72 });
    expect(bends).toEqual([{ x: 100, y: 70 }]);
    expect(orthogonalRoute(upward, bends)).toEqual([
      { x: 0, y: 100 },
      { x: 0, y: 70 },
      { x: 100, y: 70 },
      { x: 100, y: 0 },
    ]);
  });

  it('moves a vertical run sideways', () => {
    const ends: RouteEnds = { source: end(0, 0, 'right'), target: end(100, 50, 'left') };
    expect(orthogonalRoute(ends, moveSegment(ends, [], 1, { x: 78, y: 10 }))).toEqual([
      { x: 0, y: 0 },
      { x: 80, y: 0 },
      { x: 80, y: 50 },
      { x: 100, y: 50 },
    ]);
  });

  it('lets a run lengthen a stub but not push it back into the part', () => {
    const crossingAt = (towards: Point) => orthogonalRoute(upward, moveSegment(upward, [], 1, towards))[1]!.y;
    expect(crossingAt({ x: 0, y: 140 })).toBe(90);
    expect(crossingAt({ x: 0, y: -40 })).toBe(10);
  });

  it('leaves the bends alone for a run that touches a port or does not move', () => {
    const bends = [{ x: 50, y: 50 }];
    expect(moveSegment(upward, bends, 0, { x: 70, y: 70 })).toBe(bends);
    expect(moveSegment(upward, bends, 2, { x: 70, y: 70 })).toBe(bends);
    expect(moveSegment(upward, bends, 1, { x: 0, y: 52 })).toBe(bends);
  });

  it('moves a bend to the nearest grid point and removes one', () => {
    const bends: Point[] = [{ x: 50, y: 60 }, { x: 150, y: 40 }];
    expect(moveBend(bends, 1, { x: 163, y: 21 })).toEqual([{ x: 50, y: 60 }, { x: 160, y: 20 }]);
    expect(removeBend(bends, 0)).toEqual([{ x: 150, y: 40 }]);
  });

  it('adds a bend on the route nearest the pointer, in the order the route passes it', () => {
    expect(addBend(upward, [], { x: 33, y: 52 })).toEqual([{ x: 30, y: 50 }]);
    expect(addBend(upward, [{ x: 30, y: 50 }], { x: 80, y: 48 })).toEqual([{ x: 30, y: 50 }, { x: 80, y: 50 }]);
    expect(addBend(upward, [{ x: 80, y: 50 }], { x: 30, y: 48 })).toEqual([{ x: 30, y: 50 }, { x: 80, y: 50 }]);
    expect(addBend(upward, [], { x: 3, y: 77 })).toEqual([{ x: 0, y: 80 }]);
  });

  it('adds no bend inside a stub or where one already is', () => {
    expect(addBend(upward, [], { x: 2, y: 98 })).toEqual([{ x: 0, y: 90 }]);
    const bends = [{ x: 30, y: 50 }];
    expect(addBend(upward, bends, { x: 31, y: 49 })).toBe(bends);
  });
});

const OUT = { top: { x: 0, y: -1 }, right: { x: 1, y: 0 }, bottom: { x: 0, y: 1 }, left: { x: -1, y: 0 } };
const direction = (a: Point, b: Point) => ({ x: Math.sign(b.x - a.x) || 0, y: Math.sign(b.y - a.y) || 0 });

function onRoute(route: readonly Point[], p: Point): boolean {
  return route.slice(1).some((b, i) => {
    const a = route[i]!;
    const within = (v: number, u: number, w: number) => v >= Math.min(u, w) && v <= Math.max(u, w);
    return within(p.x, a.x, b.x) && within(p.y, a.y, b.y);
  });
}
