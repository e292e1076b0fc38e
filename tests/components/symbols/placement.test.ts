import { describe, expect, it } from 'vitest';
import { symbolGeometry, type PortAnchor, type SymbolGeometry } from '@/components/symbols/geometry';
import { placeAnchor, placedGeometry, placementTransform, type Placement } from '@/components/symbols/placement';
import { COMPONENT_TYPES } from '@/engine/components/registry';

const PLACEMENTS: readonly Placement[] = [false, true].flatMap((mirrored) => ([0, 90, 180, 270] as const).map((rotation) => ({ rotation, mirrored })));

const onEdge = (g: SymbolGeometry, a: PortAnchor) =>
  ({ top: a.y === 0, bottom: a.y === g.height, left: a.x === 0, right: a.x === g.width })[a.side] && a.x >= 0 && a.x <= g.width && a.y >= 0 && a.y <= g.height;

/** Applies the CSS transform the way a browser would, with transform-origin 0 0. */
function applyTransform(transform: string, point: { x: number; y: number }) {
  const match = /^translate\((-?\d+)px, (-?\d+)px\) rotate\((\d+)deg\)( scaleX\(-1\))?$/.exec(transform);
  if (!match) throw new Error(`unexpected transform ${transform}`);
  const [, tx, ty, degrees, flip] = match;
  const x = flip ? -point.x : point.x;
  const angle = (Number(degrees) * Math.PI) / 180;
  const [cos, sin] = [Math.round(Math.cos(angle)), Math.round(Math.sin(angle))];
  return { x: x * cos - point.y * sin + Number(tx), y: x * sin + point.y * cos + Number(ty) };
}

describe('placedGeometry', () => {
  // The regulator (80 × 60) has its outlet 2 at the top and inlet 1 and exhaust 3 along the bottom, none on the centre line.
  const regulator = (placement: Placement) => placedGeometry('pressure-regulator', placement);

  it('turns the anchors clockwise about the box, a quarter turn at a time', () => {
    expect(regulator({ rotation: 0, mirrored: false }).ports).toEqual({
      '2': { x: 30, y: 0, side: 'top' },
      '1': { x: 30, y: 60, side: 'bottom' },
      '3': { x: 50, y: 60, side: 'bottom' },
    });
    expect(regulator({ rotation: 90, mirrored: false }).ports).toEqual({
      '2': { x: 60, y: 30, side: 'right' },
      '1': { x: 0, y: 30, side: 'left' },
      '3': { x: 0, y: 50, side: 'left' },
    });
    expect(regulator({ rotation: 180, mirrored: false }).ports).toEqual({
      '2': { x: 50, y: 60, side: 'bottom' },
      '1': { x: 50, y: 0, side: 'top' },
      '3': { x: 30, y: 0, side: 'top' },
    });
    expect(regulator({ rotation: 270, mirrored: false }).ports).toEqual({
      '2': { x: 0, y: 50, side: 'left' },
      '1': { x: 60, y: 50, side: 'right' },
      '3': { x: 60, y: 30, side: 'right' },
    });
  });

  it('swaps width and height for a quarter and a three-quarter turn only', () => {
    expect(PLACEMENTS.map((p) => [p.rotation, p.mirrored, regulator(p).width, regulator(p).height])).toEqual([
      [0, false, 80, 60],
      [90, false, 60, 80],
      [180, false, 80, 60],
      [270, false, 60, 80],
      [0, true, 80, 60],
      [90, true, 60, 80],
      [180, true, 80, 60],
      [270, true, 60, 80],
    ]);
  });

  it('mirrors about the vertical centre line, so left and right ports change sides', () => {
    // The pressure switch (70 × 60) takes its pilot 1 on the left edge.
    expect(placedGeometry('pressure-switch', { rotation: 0, mirrored: true }).ports).toEqual({
      '12': { x: 30, y: 0, side: 'top' },
      '14': { x: 10, y: 0, side: 'top' },
      '11': { x: 20, y: 60, side: 'bottom' },
      '1': { x: 70, y: 30, side: 'right' },
    });
    expect(placedGeometry('pressure-switch', { rotation: 180, mirrored: true }).ports['1']).toEqual({ x: 0, y: 30, side: 'left' });
  });

  it('mirrors first, then turns', () => {
    expect(regulator({ rotation: 90, mirrored: true }).ports).toEqual({
      '2': { x: 60, y: 50, side: 'right' },
      '1': { x: 0, y: 50, side: 'left' },
      '3': { x: 0, y: 30, side: 'left' },
    });
  });

  it('gives back the original after four quarter turns', () => {
    for (const type of COMPONENT_TYPES) {
      const geometry = symbolGeometry(type.id);
      for (const [port, anchor] of Object.entries(geometry.ports)) {
        let placed = anchor;
        let size: { width: number; height: number } = geometry;
        for (let turn = 0; turn < 4; turn += 1) {
          placed = placeAnchor(placed, size, { rotation: 90, mirrored: false });
          size = { width: size.height, height: size.width };
        }
        expect(placed, `${type.id} port ${port}`).toEqual(anchor);
      }
    }
  });

  it('leaves an unknown type its generic box with the ports named', () => {
    expect(placedGeometry('no-such-part', { rotation: 90, mirrored: false }, ['a', 'b'])).toEqual({
      width: 60,
      height: 60,
      ports: { a: { x: 60, y: 20, side: 'right' }, b: { x: 0, y: 20, side: 'left' } },
    });
  });

  describe.each(COMPONENT_TYPES.map((t) => [t.id] as const))('%s', (typeId) => {
    const geometry = symbolGeometry(typeId);

    it.each(PLACEMENTS.map((p) => [`${p.rotation}°${p.mirrored ? ' mirrored' : ''}`, p] as const))('at %s keeps every port on the box edge and the grid', (_name, placement) => {
      const placed = placedGeometry(typeId, placement);
      expect([placed.width % 10, placed.height % 10]).toEqual([0, 0]);
      expect(Object.keys(placed.ports).sort()).toEqual(Object.keys(geometry.ports).sort());
      for (const [port, anchor] of Object.entries(placed.ports)) {
        expect(onEdge(placed, anchor), `${port} at ${anchor.x},${anchor.y} (${anchor.side})`).toBe(true);
        expect([anchor.x % 10, anchor.y % 10], port).toEqual([0, 0]);
      }
    });

    it('is drawn by its transform so that the drawn ports land on the placed anchors', () => {
      for (const placement of PLACEMENTS) {
        const placed = placedGeometry(typeId, placement);
        const transform = placementTransform(geometry, placement);
        for (const [port, anchor] of Object.entries(geometry.ports)) {
          const drawn = applyTransform(transform, anchor);
          expect(drawn, `${port} at ${transform}`).toEqual({ x: placed.ports[port]!.x, y: placed.ports[port]!.y });
        }
      }
    });
  });
});

describe('placementTransform', () => {
  it('turns about the top left corner and moves the symbol back into the placed box', () => {
    const size = { width: 80, height: 60 };
    expect(placementTransform(size, { rotation: 0, mirrored: false })).toBe('translate(0px, 0px) rotate(0deg)');
    expect(placementTransform(size, { rotation: 90, mirrored: false })).toBe('translate(60px, 0px) rotate(90deg)');
    expect(placementTransform(size, { rotation: 180, mirrored: false })).toBe('translate(80px, 60px) rotate(180deg)');
    expect(placementTransform(size, { rotation: 270, mirrored: false })).toBe('translate(0px, 80px) rotate(270deg)');
    expect(placementTransform(size, { rotation: 0, mirrored: true })).toBe('translate(80px, 0px) rotate(0deg) scaleX(-1)');
    expect(placementTransform(size, { rotation: 90, mirrored: true })).toBe('translate(60px, 80px) rotate(90deg) scaleX(-1)');
  });
});
