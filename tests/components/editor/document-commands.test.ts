import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent, checkConnection, connect, duplicateItems, NEW_TUBE, removeItems } from '@/components/editor/document-commands';
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
