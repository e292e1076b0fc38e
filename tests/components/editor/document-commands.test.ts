import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import {
  addComponent,
  alignComponents,
  checkConnection,
  connect,
  distributeComponents,
  duplicateItems,
  mirrorComponents,
  NEW_TUBE,
  removeItems,
  rotateComponents,
  setBends,
} from '@/components/editor/document-commands';
import { placedGeometry } from '@/components/symbols/placement';
import { nextTag } from '@/components/editor/tags';
import { circuitDocumentSchema, emptyDocument, type CircuitDocument } from '@/engine/document/schema';

function withParts(...types: string[]): { doc: CircuitDocument; ids: string[] } {
  const ids: string[] = [];
  const doc = produce(emptyDocument(), (d) => {
    types.forEach((t, i) => ids.push(addComponent(d, t, { x: 100 * i, y: 0 })));
  });
  return { doc, ids };
}

describe('new components', () => {
  it('get the next free designation of their kind (common practice numbering)', () => {
    const { doc } = withParts('air-supply', 'valve-3-2-nc', 'valve-3-2-nc', 'two-pressure-valve', 'valve-5-2', 'cylinder-double-acting', 'cylinder-double-acting', 'relay-coil', 'pushbutton-no', 'solenoid-coil', 'relay-contact-no');
    expect(doc.components.map((c) => c.tag)).toEqual(['0Z1', '1S1', '1S2', '1V1', '1V2', '1A1', '2A1', 'K1', 'S1', '1M1', 'K?.1']);
  });

  it('fill gaps and ignore case when numbering', () => {
    expect(nextTag({ id: 'valve-5-2', category: 'final-valve' }, ['1v1', '1V3'])).toBe('1V2');
    expect(nextTag({ id: 'cylinder-double-acting', category: 'actuator' }, ['1A1', '3A1'])).toBe('2A1');
  });

  it('keep the document valid against the published schema, with unique ids', () => {
    const { doc, ids } = withParts('valve-5-2', 'valve-5-2', 'throttle');
    expect(new Set(ids).size).toBe(3);
    expect(circuitDocumentSchema.safeParse(doc).success).toBe(true);
  });

  it('refuse an unknown type', () => {
    expect(() => produce(emptyDocument(), (d) => void addComponent(d, 'no-such-part', { x: 0, y: 0 }))).toThrow(/unknown component type/);
  });
});

describe('connections', () => {
  const { doc, ids } = withParts('valve-5-2', 'cylinder-double-acting', 'relay-coil', 'dc-supply');
  const [valve, cylinder, coil, supply] = ids as [string, string, string, string];

  it('join air ports with a tube of the default size and terminals with a wire', () => {
    const next = produce(doc, (d) => {
      expect(connect(d, { component: valve, port: '4' }, { component: cylinder, port: 'A' }).ok).toBe(true);
      expect(connect(d, { component: supply, port: 'L+' }, { component: coil, port: 'A1' }).ok).toBe(true);
    });
    expect(next.tubes).toEqual([{ id: 't1', from: { component: valve, port: '4' }, to: { component: cylinder, port: 'A' }, ...NEW_TUBE, bends: [] }]);
    expect(next.wires).toEqual([{ id: 'w1', from: { component: supply, port: 'L+' }, to: { component: coil, port: 'A1' }, bends: [] }]);
  });

  it('refuse an air port to a terminal, a port to itself, an unknown port and a second tube between the same ports', () => {
    expect(checkConnection(doc, { component: valve, port: '4' }, { component: coil, port: 'A1' })).toMatchObject({ ok: false, reason: expect.stringMatching(/air port joins air ports only/) });
    expect(checkConnection(doc, { component: valve, port: '4' }, { component: valve, port: '4' })).toMatchObject({ ok: false });
    expect(checkConnection(doc, { component: valve, port: '9' }, { component: cylinder, port: 'A' })).toMatchObject({ ok: false, reason: 'That port does not exist.' });
    const joined = produce(doc, (d) => void connect(d, { component: valve, port: '2' }, { component: cylinder, port: 'B' }));
    expect(checkConnection(joined, { component: cylinder, port: 'B' }, { component: valve, port: '2' })).toMatchObject({ ok: false, reason: 'These two ports are already joined.' });
  });

  it('go with the components they touch when those are removed', () => {
    const joined = produce(doc, (d) => {
      connect(d, { component: valve, port: '4' }, { component: cylinder, port: 'A' });
      connect(d, { component: supply, port: 'L+' }, { component: coil, port: 'A1' });
      d.links.push({ id: 'l1', kind: 'solenoid', from: coil, to: valve });
    });
    const after = produce(joined, (d) => removeItems(d, { components: [cylinder, coil], tubes: [], wires: [] }));
    expect(after.components.map((c) => c.id)).toEqual([valve, supply]);
    expect(after.tubes).toEqual([]);
    expect(after.wires).toEqual([]);
    expect(after.links).toEqual([]);
  });
});

describe('duplicating', () => {
  it('copies parts with new ids and designations, and only the tubes and wires between copied parts', () => {
    const { doc, ids } = withParts('valve-5-2', 'cylinder-double-acting', 'air-supply');
    const [valve, cylinder, supply] = ids as [string, string, string];
    const joined = produce(doc, (d) => {
      connect(d, { component: valve, port: '4' }, { component: cylinder, port: 'A' });
      connect(d, { component: supply, port: '2' }, { component: valve, port: '1' });
      d.components[0]!.parameters = { actuation: 'pilot' };
    });
    let copies: string[] = [];
    const after = produce(joined, (d) => {
      copies = duplicateItems(d, joined, [valve, cylinder, 'no-such-part'], { x: 20, y: 40 });
    });
    expect(copies).toHaveLength(2);
    const [valveCopy, cylinderCopy] = copies.map((id) => after.components.find((c) => c.id === id)!);
    expect(valveCopy).toMatchObject({ type: 'valve-5-2', tag: '1V2', parameters: { actuation: 'pilot' }, position: { x: 20, y: 40 } });
    expect(cylinderCopy).toMatchObject({ type: 'cylinder-double-acting', tag: '2A1', position: { x: 120, y: 40 } });
    // The tube between valve and cylinder is copied; the one from the supply (not copied) is not.
    expect(after.tubes).toHaveLength(3);
    expect(after.tubes[2]).toMatchObject({ from: { component: valveCopy!.id, port: '4' }, to: { component: cylinderCopy!.id, port: 'A' } });
    expect(new Set(after.tubes.map((t) => t.id)).size).toBe(3);
    expect(circuitDocumentSchema.safeParse(after).success).toBe(true);
    // The originals are untouched.
    expect(after.components.slice(0, 3)).toEqual(joined.components);
  });

  it('pastes what was copied from an earlier state of the document, even after the originals went', () => {
    const { doc, ids } = withParts('throttle');
    const copiedFrom = doc;
    const emptied = produce(doc, (d) => removeItems(d, { components: ids, tubes: [], wires: [] }));
    const pasted = produce(emptied, (d) => void duplicateItems(d, copiedFrom, ids, { x: 10, y: 10 }));
    expect(pasted.components).toEqual([expect.objectContaining({ type: 'throttle', tag: '1V1', position: { x: 10, y: 10 } })]);
  });
});

/** Parts of the given types, placed at [x, y] with an optional turn. */
function placed(spots: ReadonlyArray<readonly [type: string, x: number, y: number, rotation?: 0 | 90 | 180 | 270]>): { doc: CircuitDocument; ids: string[] } {
  const { doc, ids } = withParts(...spots.map(([type]) => type));
  const moved = produce(doc, (d) => {
    spots.forEach(([, x, y, rotation = 0], i) => {
      d.components[i]!.position = { x, y };
      d.components[i]!.rotation = rotation;
    });
  });
  return { doc: moved, ids };
}

const spotsOf = (doc: CircuitDocument) => doc.components.map((c) => [c.position.x, c.position.y, c.rotation]);

describe('turning', () => {
  // The cylinder's box is 160 × 50, the relay coil's 60 × 60.
  const { doc, ids } = placed([
    ['cylinder-double-acting', 0, 0],
    ['relay-coil', 100, 0],
    ['relay-coil', 300, 300],
  ]);
  const picked = ids.slice(0, 2);

  it('turns each part clockwise about its own centre, to the nearest grid point', () => {
    const turned = produce(doc, (d) => rotateComponents(d, picked, 1));
    // The cylinder's centre (80, 25) would need the corner at (55, -55).
    expect(spotsOf(turned)).toEqual([
      [60, -60, 90],
      [100, 0, 90],
      [300, 300, 0],
    ]);
  });

  it('turns anticlockwise, and back to where the part was', () => {
    const back = produce(doc, (d) => rotateComponents(d, picked, -1));
    expect(spotsOf(back).slice(0, 2)).toEqual([
      [60, -60, 270],
      [100, 0, 270],
    ]);
    expect(produce(back, (d) => rotateComponents(d, picked, 1))).toEqual(doc);
  });

  it('comes back to the start after four quarter turns, one at a time, with no drift', () => {
    let turned = doc;
    for (let turn = 0; turn < 4; turn += 1) turned = produce(turned, (d) => rotateComponents(d, picked, 1));
    expect(turned).toEqual(doc);
  });

  it('keeps the place of a part given a half turn', () => {
    expect(spotsOf(produce(doc, (d) => rotateComponents(d, picked, 2))).slice(0, 2)).toEqual([
      [0, 0, 180],
      [100, 0, 180],
    ]);
  });
});

describe('flipping', () => {
  it('mirrors a part, and a second flip undoes the first', () => {
    const { doc, ids } = placed([['valve-5-2', 0, 0]]);
    const flipped = produce(doc, (d) => mirrorComponents(d, ids));
    expect(flipped.components[0]).toMatchObject({ mirrored: true, rotation: 0, position: { x: 0, y: 0 } });
    expect(produce(flipped, (d) => mirrorComponents(d, ids))).toEqual(doc);
  });

  it('flips a turned part left to right as it appears on the drawing', () => {
    // The regulator at a quarter turn has its outlet 2 on the right, inlet 1 and exhaust 3 on the left.
    const { doc, ids } = placed([['pressure-regulator', 0, 0, 90]]);
    const flipped = produce(doc, (d) => mirrorComponents(d, ids)).components[0]!;
    expect(flipped).toMatchObject({ mirrored: true, rotation: 270, position: { x: 0, y: 0 } });
    expect(placedGeometry(flipped.type, flipped).ports).toEqual({
      '2': { x: 0, y: 30, side: 'left' },
      '1': { x: 60, y: 30, side: 'right' },
      '3': { x: 60, y: 50, side: 'right' },
    });
  });
});

describe('aligning', () => {
  // Boxes: cylinder 160 × 50, relay coil 60 × 60, regulator at a quarter turn 60 × 80.
  const { doc, ids } = placed([
    ['cylinder-double-acting', 0, 40],
    ['relay-coil', 300, 100],
    ['pressure-regulator', 120, 210, 90],
  ]);
  const aligned = (how: Parameters<typeof alignComponents>[2]) => produce(doc, (d) => alignComponents(d, ids, how)).components.map((c) => [c.position.x, c.position.y]);

  it('lines up edges on the outermost part by the placed boxes', () => {
    expect(aligned('left')).toEqual([
      [0, 40],
      [0, 100],
      [0, 210],
    ]);
    expect(aligned('right')).toEqual([
      [200, 40],
      [300, 100],
      [300, 210],
    ]);
    expect(aligned('top')).toEqual([
      [0, 40],
      [300, 40],
      [120, 40],
    ]);
    expect(aligned('bottom')).toEqual([
      [0, 240],
      [300, 230],
      [120, 210],
    ]);
  });

  it('lines up centres on the middle of the selection, to the nearest grid point', () => {
    expect(aligned('centre')).toEqual([
      [100, 40],
      [150, 100],
      [150, 210],
    ]);
    // The middle line is at y = 165; the coil's and regulator's corners would fall between grid points.
    expect(aligned('middle')).toEqual([
      [0, 140],
      [300, 140],
      [120, 130],
    ]);
  });

  it('needs two parts, and changes nothing already lined up', () => {
    expect(produce(doc, (d) => alignComponents(d, [ids[1]!], 'left'))).toBe(doc);
    const once = produce(doc, (d) => alignComponents(d, ids, 'top'));
    expect(produce(once, (d) => alignComponents(d, ids, 'top'))).toBe(once);
  });
});

describe('distributing', () => {
  it('spaces the centres evenly between the two outermost parts, in the order they stand', () => {
    // Centres at x = 120, 30, 530 and 340 (cylinder 160, coil 60, regulator 80 wide).
    const { doc, ids } = placed([
      ['cylinder-double-acting', 40, 100],
      ['relay-coil', 0, 0],
      ['relay-coil', 500, 300],
      ['pressure-regulator', 300, 200],
    ]);
    const spread = produce(doc, (d) => distributeComponents(d, ids, 'horizontal'));
    // Even centres from left to right would be 30, 196.7, 363.3 and 530.
    expect(spread.components.map((c) => [c.position.x, c.position.y])).toEqual([
      [120, 100],
      [0, 0],
      [500, 300],
      [320, 200],
    ]);
  });

  it('spaces them up and down by their placed boxes', () => {
    // Centres at y = 30, 50 and 225; the regulator's box at a quarter turn is 80 high.
    const { doc, ids } = placed([
      ['relay-coil', 0, 0],
      ['pressure-regulator', 200, 10, 90],
      ['cylinder-double-acting', 400, 200],
    ]);
    const spread = produce(doc, (d) => distributeComponents(d, ids, 'vertical'));
    expect(spread.components.map((c) => [c.position.x, c.position.y])).toEqual([
      [0, 0],
      [200, 90],
      [400, 200],
    ]);
  });

  it('needs three parts', () => {
    const { doc, ids } = placed([
      ['relay-coil', 0, 0],
      ['relay-coil', 50, 300],
    ]);
    expect(produce(doc, (d) => distributeComponents(d, ids, 'horizontal'))).toBe(doc);
  });
});

describe('bends', () => {
  const { doc, ids } = withParts('valve-5-2', 'cylinder-double-acting', 'dc-supply', 'relay-coil');
  const [valve, cylinder, supply, coil] = ids as [string, string, string, string];
  const joined = produce(doc, (d) => {
    connect(d, { component: valve, port: '4' }, { component: cylinder, port: 'A' });
    connect(d, { component: supply, port: 'L+' }, { component: coil, port: 'A1' });
  });
  const many = (n: number) => Array.from({ length: n }, (_, i) => ({ x: 10 * i, y: 0 }));

  it('set the points a tube or a wire is drawn through, in a valid document', () => {
    const bent = produce(joined, (d) => {
      setBends(d, 'tube', 't1', [{ x: 30, y: 70 }, { x: 130, y: 70 }]);
      setBends(d, 'wire', 'w1', [{ x: 250, y: 40 }]);
    });
    expect(bent.tubes[0]!.bends).toEqual([{ x: 30, y: 70 }, { x: 130, y: 70 }]);
    expect(bent.wires[0]!.bends).toEqual([{ x: 250, y: 40 }]);
    expect(circuitDocumentSchema.safeParse(bent).success).toBe(true);
    expect(produce(bent, (d) => setBends(d, 'tube', 't1', [])).tubes[0]!.bends).toEqual([]);
  });

  it('are no edit when unchanged, for an id not of that kind, or when more than the schema keeps', () => {
    const bent = produce(joined, (d) => setBends(d, 'tube', 't1', [{ x: 30, y: 70 }]));
    expect(produce(bent, (d) => setBends(d, 'tube', 't1', [{ x: 30, y: 70 }]))).toBe(bent);
    expect(produce(bent, (d) => setBends(d, 'wire', 't1', []))).toBe(bent);
    expect(produce(bent, (d) => setBends(d, 'tube', 't9', []))).toBe(bent);
    const most = produce(bent, (d) => setBends(d, 'tube', 't1', many(64)));
    expect(most.tubes[0]!.bends).toHaveLength(64);
    expect(circuitDocumentSchema.safeParse(most).success).toBe(true);
    expect(circuitDocumentSchema.safeParse(produce(bent, (d) => void (d.tubes[0]!.bends = many(65)))).success).toBe(false);
    expect(produce(bent, (d) => setBends(d, 'tube', 't1', many(65)))).toBe(bent);
  });
});
