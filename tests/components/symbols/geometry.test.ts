import { describe, expect, it } from 'vitest';
import { symbolGeometry, type PortAnchor, type SymbolGeometry } from '@/components/symbols/geometry';
import { COMPONENT_TYPES } from '@/engine/components/registry';

const onEdge = (g: SymbolGeometry, a: PortAnchor) => {
  switch (a.side) {
    case 'top':
      return a.y === 0 && a.x >= 0 && a.x <= g.width;
    case 'bottom':
      return a.y === g.height && a.x >= 0 && a.x <= g.width;
    case 'left':
      return a.x === 0 && a.y >= 0 && a.y <= g.height;
    case 'right':
      return a.x === g.width && a.y >= 0 && a.y <= g.height;
  }
};

describe('symbolGeometry', () => {
  describe.each(COMPONENT_TYPES.map((t) => [t.id, t] as const))('%s', (_id, type) => {
    const geometry = symbolGeometry(type.id);

    it('has a box on the 10-unit grid', () => {
      expect(geometry.width % 10).toBe(0);
      expect(geometry.height % 10).toBe(0);
      expect(geometry.width).toBeGreaterThanOrEqual(40);
      expect(geometry.height).toBeGreaterThanOrEqual(40);
    });

    it('anchors every port, and nothing else, on the box edge and the grid', () => {
      expect(Object.keys(geometry.ports).sort()).toEqual(type.ports.map((p) => p.id).sort());
      for (const port of type.ports) {
        const anchor = geometry.ports[port.id]!;
        expect(onEdge(geometry, anchor), `${port.id} at ${anchor.x},${anchor.y} (${anchor.side})`).toBe(true);
        expect([anchor.x % 10, anchor.y % 10], port.id).toEqual([0, 0]);
      }
    });

    it('gives no two ports the same point', () => {
      const points = Object.values(geometry.ports).map((a) => `${a.x},${a.y}`);
      expect(new Set(points).size).toBe(points.length);
    });

    it('runs current paths top to bottom', () => {
      for (const port of type.ports.filter((p) => p.role === 'terminal')) {
        expect(['top', 'bottom'], port.id).toContain(geometry.ports[port.id]!.side);
      }
    });
  });

  it('lays valves out as circuit drawings do: working ports above, supply and exhausts below, pilots at the ends', () => {
    const valves = COMPONENT_TYPES.filter((t) => t.positions && t.pilotPorts);
    expect(valves.length).toBeGreaterThanOrEqual(12);
    for (const type of valves) {
      const { ports } = symbolGeometry(type.id);
      const side = (id: string) => ports[id]!.side;
      expect([side(type.pilotPorts![0]), side(type.pilotPorts![1])], type.id).toEqual(['left', 'right']);
      for (const port of type.ports.filter((p) => p.role !== 'pilot')) {
        expect(side(port.id), `${type.id} ${port.id}`).toBe(port.role === 'working' ? 'top' : 'bottom');
      }
    }
  });

  it('puts a 5/2 valve’s ports in the order ISO drawings use: 4 2 above, 5 1 3 below', () => {
    const { ports } = symbolGeometry('valve-5-2');
    const xs = (ids: string[]) => ids.map((id) => ports[id]!.x);
    expect(xs(['4', '2'])).toEqual([...xs(['4', '2'])].sort((a, b) => a - b));
    expect(xs(['5', '1', '3'])).toEqual([...xs(['5', '1', '3'])].sort((a, b) => a - b));
    expect(ports['4']!.x).toBe(ports['5']!.x);
    expect(ports['2']!.x).toBe(ports['3']!.x);
  });

  it('draws coils and contacts A1 and 13 above, A2 and 14 below; cylinder ports below', () => {
    expect(symbolGeometry('relay-coil').ports.A1!.side).toBe('top');
    expect(symbolGeometry('relay-coil').ports.A2!.side).toBe('bottom');
    expect(symbolGeometry('pushbutton-no').ports['13']!.side).toBe('top');
    expect(symbolGeometry('pushbutton-no').ports['14']!.side).toBe('bottom');
    expect(symbolGeometry('dc-supply').ports['L+']!.side).toBe('top');
    expect(symbolGeometry('dc-supply').ports.M!.side).toBe('bottom');
    const cylinder = symbolGeometry('cylinder-double-acting').ports;
    expect([cylinder.A!.side, cylinder.B!.side]).toEqual(['bottom', 'bottom']);
    expect(cylinder.A!.x).toBeLessThan(cylinder.B!.x);
  });

  it('returns the same geometry object for a type every time (the canvas asks on every render)', () => {
    expect(symbolGeometry('valve-5-2')).toBe(symbolGeometry('valve-5-2'));
  });

  describe('an unknown type id', () => {
    it('gets a plain box without throwing', () => {
      const geometry = symbolGeometry('no-such-type');
      expect(geometry.width).toBeGreaterThan(0);
      expect(geometry.height).toBeGreaterThan(0);
      expect(geometry.ports).toEqual({});
    });

    it('spreads the ports it is told of along the box edges, on the grid and apart', () => {
      const ids = ['1', '2', '3', '4', '5'];
      const geometry = symbolGeometry('from-a-newer-version', ids);
      expect(Object.keys(geometry.ports).sort()).toEqual(ids);
      expect(geometry.width % 10).toBe(0);
      const points = Object.values(geometry.ports).map((a) => `${a.x},${a.y}`);
      expect(new Set(points).size).toBe(ids.length);
      for (const anchor of Object.values(geometry.ports)) expect(onEdge(geometry, anchor)).toBe(true);
    });
  });
});
