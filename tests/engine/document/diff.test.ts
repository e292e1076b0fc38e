import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent, connect, moveComponents, removeItems, setBends } from '@/components/editor/document-commands';
import { setTag } from '@/components/editor/inspector-commands';
import { diffDocuments, type DocumentDiff } from '@/engine/document/diff';
import { type CircuitDocument } from '@/engine/document/schema';
import { demoDocument } from '@/tests/support/demo-circuits';

const twoHand = demoDocument('lid-press-two-hand');
const relayControl = demoDocument('lid-press-relay-control');
const cartonClamp = demoDocument('carton-clamp-sequence');

const component = (doc: CircuitDocument, id: string) => doc.components.find((c) => c.id === id)!;
const nothing = { added: [], removed: [], changed: [] };
const noCounts = { added: 0, removed: 0, changed: 0 };

const EMPTY: DocumentDiff = {
  components: nothing,
  tubes: nothing,
  wires: nothing,
  links: nothing,
  settings: [],
  summary: { components: noCounts, tubes: noCounts, wires: noCounts, links: noCounts, settings: 0, affectsBehaviour: false, isEmpty: true },
};

describe('diffDocuments', () => {
  it('finds nothing between a document and a copy of it', () => {
    for (const name of ['lid-press-two-hand', 'lid-press-relay-control', 'carton-clamp-sequence', 'reject-gate-quick-exhaust']) {
      expect(diffDocuments(demoDocument(name), demoDocument(name)), name).toEqual(EMPTY);
    }
  });

  it('reports a changed throttle opening as a behaviour change, with the old and new value', () => {
    const after = produce(twoHand, (d) => {
      component(d, 'meter').parameters.opening = 0.4;
    });
    const diff = diffDocuments(twoHand, after);
    expect(diff.components.changed).toEqual([
      {
        id: 'meter',
        tag: '1V3',
        tagBefore: '1V3',
        type: 'one-way-flow-control',
        typeBefore: 'one-way-flow-control',
        changes: [{ kind: 'parameter', name: 'opening', before: 0.25, after: 0.4, affects: 'behaviour' }],
      },
    ]);
    expect(diff.summary).toEqual({ ...EMPTY.summary, components: { ...noCounts, changed: 1 }, affectsBehaviour: true, isEmpty: false });
  });

  it('reports an added check valve and the tube that joins it, ends named by tag', () => {
    const after = produce(twoHand, (d) => {
      const id = addComponent(d, 'check-valve', { x: 440, y: 150 });
      connect(d, { component: 'meter', port: '2' }, { component: id, port: '1' });
    });
    const diff = diffDocuments(twoHand, after);
    expect(diff.components).toEqual({ ...nothing, added: [{ id: 'check-valve-1', tag: '1V4', type: 'check-valve' }] });
    expect(diff.tubes).toEqual({
      ...nothing,
      added: [{ id: 't11', from: { component: 'meter', port: '2', tag: '1V3' }, to: { component: 'check-valve-1', port: '1', tag: '1V4' } }],
    });
    expect(diff.summary.affectsBehaviour).toBe(true);
  });

  it('reports removed components with their tubes, in tag order', () => {
    const after = produce(twoHand, (d) => removeItems(d, { components: ['right', 'gauge', 'left'], tubes: [], wires: [] }));
    const diff = diffDocuments(twoHand, after);
    expect(diff.components.removed).toEqual([
      { id: 'gauge', tag: '0P1', type: 'pressure-gauge' },
      { id: 'left', tag: '1S1', type: 'valve-3-2-nc' },
      { id: 'right', tag: '1S2', type: 'valve-3-2-nc' },
    ]);
    expect(diff.tubes.removed).toEqual([
      { id: 't10', from: { component: 'gauge', port: '1', tag: '0P1' }, to: { component: 'press', port: 'A', tag: '1A1' } },
      { id: 't1', from: { component: 'supply', port: '2', tag: '0Z1' }, to: { component: 'left', port: '1', tag: '1S1' } },
      { id: 't2', from: { component: 'supply', port: '2', tag: '0Z1' }, to: { component: 'right', port: '1', tag: '1S2' } },
      { id: 't3', from: { component: 'left', port: '2', tag: '1S1' }, to: { component: 'and', port: '1.1', tag: '1V1' } },
      { id: 't4', from: { component: 'right', port: '2', tag: '1S2' }, to: { component: 'and', port: '1.2', tag: '1V1' } },
    ]);
    expect(diff.summary).toMatchObject({ components: { added: 0, removed: 3, changed: 0 }, tubes: { added: 0, removed: 5, changed: 0 } });
  });

  it('lists changed components by their tags after the change, numbers compared as numbers', () => {
    const after = produce(twoHand, (d) => {
      void setTag(d, 'and', '1V10');
      component(d, 'meter').parameters.opening = 0.4;
      component(d, 'main').parameters.switchTime = 0.03;
    });
    expect(diffDocuments(twoHand, after).components.changed.map((c) => [c.tagBefore, c.tag])).toEqual([
      ['1V2', '1V2'],
      ['1V3', '1V3'],
      ['1V1', '1V10'],
    ]);
  });

  it('reports a tube length change', () => {
    const after = produce(twoHand, (d) => {
      d.tubes.find((t) => t.id === 't8')!.lengthM = 1.2;
    });
    expect(diffDocuments(twoHand, after).tubes.changed).toEqual([
      {
        id: 't8',
        from: { component: 'main', port: '2', tag: '1V2' },
        to: { component: 'meter', port: '1', tag: '1V3' },
        changes: [{ kind: 'lengthM', before: 0.5, after: 1.2, affects: 'behaviour' }],
      },
    ]);
  });

  it('reports a re-connected wire with the ends before and after', () => {
    const after = produce(relayControl, (d) => {
      d.wires.find((w) => w.id === 'w9')!.from = { component: 'hold', port: '14' };
    });
    const lamp = { component: 'lamp', port: 'X1', tag: 'H1' };
    expect(diffDocuments(relayControl, after).wires.changed).toEqual([
      {
        id: 'w9',
        from: { component: 'hold', port: '14', tag: 'K1.1' },
        to: lamp,
        changes: [
          {
            kind: 'ends',
            before: { from: { component: 'dwellBreak', port: '22', tag: 'KT1.1' }, to: lamp },
            after: { from: { component: 'hold', port: '14', tag: 'K1.1' }, to: lamp },
            affects: 'behaviour',
          },
        ],
      },
    ]);
  });

  it('sees a tube or wire drawn from its other end, bends reversed, as the same connection', () => {
    const bent = produce(relayControl, (d) => setBends(d, 'wire', 'w9', [{ x: 700, y: 360 }, { x: 740, y: 400 }]));
    const turned = produce(bent, (d) => {
      const wire = d.wires.find((w) => w.id === 'w9')!;
      [wire.from, wire.to] = [wire.to, wire.from];
      wire.bends.reverse();
    });
    expect(diffDocuments(bent, turned)).toEqual(EMPTY);
  });

  it('marks a part moved, turned and flipped, and a re-routed tube, as drawing changes only', () => {
    const after = produce(twoHand, (d) => {
      moveComponents(d, [{ id: 'press', x: 280, y: 40 }]);
      component(d, 'press').rotation = 90;
      component(d, 'press').mirrored = true;
      setBends(d, 'tube', 't7', [{ x: 260, y: 140 }]);
    });
    const diff = diffDocuments(twoHand, after);
    expect(diff.components.changed).toEqual([
      {
        id: 'press',
        tag: '1A1',
        tagBefore: '1A1',
        type: 'cylinder-double-acting',
        typeBefore: 'cylinder-double-acting',
        changes: [
          { kind: 'position', before: { x: 240, y: 40 }, after: { x: 280, y: 40 }, affects: 'drawing' },
          { kind: 'rotation', before: 0, after: 90, affects: 'drawing' },
          { kind: 'mirrored', before: false, after: true, affects: 'drawing' },
        ],
      },
    ]);
    expect(diff.tubes.changed).toEqual([
      {
        id: 't7',
        from: { component: 'main', port: '4', tag: '1V2' },
        to: { component: 'press', port: 'A', tag: '1A1' },
        changes: [{ kind: 'bends', before: [], after: [{ x: 260, y: 140 }], affects: 'drawing' }],
      },
    ]);
    expect(diff.summary).toMatchObject({ affectsBehaviour: false, isEmpty: false });
  });

  it('sees no change between a parameter stored at its default and one left out', () => {
    const after = produce(twoHand, (d) => {
      delete component(d, 'press').parameters.stroke; // stored as 0.1 m, the cylinder's default
      component(d, 'main').parameters.switchTime = 0.015; // the valve's default
    });
    expect(diffDocuments(twoHand, after)).toEqual(EMPTY);
  });

  it('compares a parameter left out with its default when the other side sets it', () => {
    const after = produce(twoHand, (d) => {
      component(d, 'main').parameters.switchTime = 0.03;
    });
    expect(diffDocuments(twoHand, after).components.changed[0]?.changes).toEqual([
      { kind: 'parameter', name: 'switchTime', before: 0.015, after: 0.03, affects: 'behaviour' },
    ]);
  });

  it('reports a renamed coil once, and the contacts that follow it', () => {
    const after = produce(relayControl, (d) => void setTag(d, 'k1', 'K5'));
    const coilChange = (id: string, tag: string) => ({
      id,
      tag,
      tagBefore: tag,
      type: 'relay-contact-no',
      typeBefore: 'relay-contact-no',
      changes: [{ kind: 'parameter', name: 'coil', before: 'K1', after: 'K5', affects: 'behaviour' }],
    });
    expect(diffDocuments(relayControl, after).components).toEqual({
      ...nothing,
      changed: [
        coilChange('hold', 'K1.1'),
        coilChange('drive', 'K1.2'),
        { id: 'k1', tag: 'K5', tagBefore: 'K1', type: 'relay-coil', typeBefore: 'relay-coil', changes: [{ kind: 'tag', before: 'K1', after: 'K5', affects: 'behaviour' }] },
      ],
    });
  });

  it('reports a type change, and a parameter only one of the two types has', () => {
    const after = produce(twoHand, (d) => {
      component(d, 'meter').type = 'throttle';
    });
    expect(diffDocuments(twoHand, after).components.changed).toEqual([
      {
        id: 'meter',
        tag: '1V3',
        tagBefore: '1V3',
        type: 'throttle',
        typeBefore: 'one-way-flow-control',
        changes: [
          { kind: 'type', before: 'one-way-flow-control', after: 'throttle', affects: 'behaviour' },
          { kind: 'parameter', name: 'checkConductance', before: 1e-8, after: undefined, affects: 'behaviour' },
        ],
      },
    ]);
  });

  it('reports label and notes as drawing changes, an empty text as none', () => {
    const after = produce(twoHand, (d) => {
      component(d, 'press').label = 'Lid press, 50 mm bore';
      component(d, 'press').notes = 'Load measured on the line in week 12.';
      component(d, 'gauge').label = '';
    });
    expect(diffDocuments(twoHand, after).components.changed[0]?.changes).toEqual([
      { kind: 'label', before: 'Lid press', after: 'Lid press, 50 mm bore', affects: 'drawing' },
      { kind: 'notes', before: undefined, after: 'Load measured on the line in week 12.', affects: 'drawing' },
    ]);
  });

  it('reports each changed setting', () => {
    const after = produce(twoHand, (d) => {
      d.settings.ambientPressurePa = 95_000;
      d.settings.ambientTemperatureK = 303.15;
    });
    const diff = diffDocuments(twoHand, after);
    expect(diff.settings).toEqual([
      { kind: 'ambientPressurePa', before: 101_325, after: 95_000, affects: 'behaviour' },
      { kind: 'ambientTemperatureK', before: 293.15, after: 303.15, affects: 'behaviour' },
    ]);
    expect(diff.summary).toEqual({ ...EMPTY.summary, settings: 2, affectsBehaviour: true, isEmpty: false });
  });

  it('reports a link moved to another sensor at another stroke position', () => {
    const after = produce(cartonClamp, (d) => {
      const link = d.links.find((l) => l.id === 'l1')!;
      link.to = 'start';
      link.positionM = 0.045;
    });
    expect(diffDocuments(cartonClamp, after).links).toEqual({
      ...nothing,
      changed: [
        {
          id: 'l1',
          kind: 'actuation',
          from: { component: 'clamp', tag: '1A1' },
          to: { component: 'start', tag: '1S1' },
          positionM: 0.045,
          changes: [
            { kind: 'to', before: { component: 'end', tag: '1S2' }, after: { component: 'start', tag: '1S1' }, affects: 'behaviour' },
            { kind: 'positionM', before: 0.05, after: 0.045, affects: 'behaviour' },
          ],
        },
      ],
    });
  });

  it('reports links added and removed with the parts they couple', () => {
    const after = produce(relayControl, (d) => {
      d.links = [{ id: 'l-up', kind: 'actuation', from: 'press', to: 'down', positionM: 0 }];
    });
    const diff = diffDocuments(relayControl, after).links;
    expect(diff.added).toEqual([{ id: 'l-up', kind: 'actuation', from: { component: 'press', tag: '1A1' }, to: { component: 'down', tag: '1B2' }, positionM: 0 }]);
    expect(diff.removed).toEqual([{ id: 'l-down', kind: 'actuation', from: { component: 'press', tag: '1A1' }, to: { component: 'down', tag: '1B2' }, positionM: 0.1 }]);
  });
});
