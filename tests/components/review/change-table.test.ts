import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent, moveComponents, removeItems } from '@/components/editor/document-commands';
import { setTag } from '@/components/editor/inspector-commands';
import { changeTableRows } from '@/components/review/change-table';
import { diffDocuments } from '@/engine/document/diff';
import { type CircuitDocument } from '@/engine/document/schema';
import { demoDocument } from '@/tests/support/demo-circuits';

const twoHand = demoDocument('lid-press-two-hand');
const relayControl = demoDocument('lid-press-relay-control');
const cartonClamp = demoDocument('carton-clamp-sequence');

const component = (doc: CircuitDocument, id: string) => doc.components.find((c) => c.id === id)!;
const rowsAfter = (before: CircuitDocument, recipe: (draft: CircuitDocument) => void) => changeTableRows(diffDocuments(before, produce(before, recipe)));

describe('changeTableRows', () => {
  it('has no rows when nothing changed', () => {
    expect(changeTableRows(diffDocuments(twoHand, twoHand))).toEqual([]);
  });

  it('shows parameters under their labels in the editor units', () => {
    const rows = rowsAfter(twoHand, (d) => {
      component(d, 'meter').parameters.opening = 0.4;
      component(d, 'supply').parameters.pressure = 550_000;
      component(d, 'press').parameters.bore = 0.063;
      component(d, 'main').parameters.switchTime = 0.03;
    });
    expect(rows).toEqual([
      { tag: '0Z1', what: 'Set pressure', before: '6 bar (gauge)', after: '5.5 bar (gauge)', affects: 'behaviour' },
      { tag: '1A1', what: 'Bore', before: '50 mm', after: '63 mm', affects: 'behaviour' },
      { tag: '1V2', what: 'Switching time', before: '0.015 s', after: '0.03 s', affects: 'behaviour' },
      { tag: '1V3', what: 'Opening', before: '25 %', after: '40 %', affects: 'behaviour' },
    ]);
  });

  it('shows a throttle opening in per cent, and choices and flags in words', () => {
    const withThrottle = produce(twoHand, (d) => {
      component(d, addComponent(d, 'throttle', { x: 400, y: 150 })).parameters.opening = 0.4;
    });
    expect(
      rowsAfter(withThrottle, (d) => {
        component(d, 'throttle-1').parameters.opening = 0.25;
        component(d, 'main').parameters.returnBy = 'pilot';
        component(d, 'main').parameters.manualOverride = false;
      }),
    ).toEqual([
      { tag: '1V2', what: 'Return', before: 'spring', after: 'pilot', affects: 'behaviour' },
      { tag: '1V2', what: 'Manual override on solenoid', before: 'yes', after: 'no', affects: 'behaviour' },
      { tag: '1V4', what: 'Opening', before: '40 %', after: '25 %', affects: 'behaviour' },
    ]);
  });

  it('shows tube sizes in metres and millimetres, tubes named by their ends', () => {
    const rows = rowsAfter(twoHand, (d) => {
      const tube = d.tubes.find((t) => t.id === 't8')!;
      tube.lengthM = 1.2;
      tube.innerDiameterM = 0.006;
    });
    expect(rows).toEqual([
      { tag: '1V2:2 – 1V3:1', what: 'Length', before: '0.5 m', after: '1.2 m', affects: 'behaviour' },
      { tag: '1V2:2 – 1V3:1', what: 'Inner diameter', before: '4 mm', after: '6 mm', affects: 'behaviour' },
    ]);
  });

  it('has a row for each added and removed part and connection', () => {
    const rows = rowsAfter(twoHand, (d) => {
      removeItems(d, { components: ['gauge'], tubes: [], wires: [] });
      addComponent(d, 'check-valve', { x: 440, y: 150 });
    });
    expect(rows).toEqual([
      { tag: '1V4', what: 'Check valve', before: '', after: 'added', affects: 'behaviour' },
      { tag: '0P1', what: 'Pressure gauge', before: '', after: 'removed', affects: 'behaviour' },
      { tag: '0P1:1 – 1A1:A', what: 'Tube', before: '', after: 'removed', affects: 'behaviour' },
    ]);
  });

  it('shows a re-connected wire by its ends', () => {
    const rows = rowsAfter(relayControl, (d) => {
      d.wires.find((w) => w.id === 'w9')!.from = { component: 'hold', port: '14' };
    });
    expect(rows).toEqual([{ tag: 'K1.1:14 – H1:X1', what: 'Ends', before: 'KT1.1:22 – H1:X1', after: 'K1.1:14 – H1:X1', affects: 'behaviour' }]);
  });

  it('names the type and tag fields in words, and the old tag among the values', () => {
    const rows = rowsAfter(relayControl, (d) => {
      void setTag(d, 'k1', 'K5');
      component(d, 'start').type = 'pushbutton-nc';
    });
    expect(rows).toEqual([
      { tag: 'K1.1', what: 'Operated by', before: 'K1', after: 'K5', affects: 'behaviour' },
      { tag: 'K1.2', what: 'Operated by', before: 'K1', after: 'K5', affects: 'behaviour' },
      { tag: 'K5', what: 'Tag', before: 'K1', after: 'K5', affects: 'behaviour' },
      { tag: 'S1', what: 'Type', before: 'Push-button, normally open', after: 'Push-button, normally closed', affects: 'behaviour' },
    ]);
  });

  it('puts drawing-only changes after behaviour changes', () => {
    const rows = rowsAfter(twoHand, (d) => {
      moveComponents(d, [{ id: 'and', x: 260, y: 360 }]);
      component(d, 'and').rotation = 180;
      component(d, 'and').label = 'Two-hand condition';
      d.tubes.find((t) => t.id === 't5')!.bends = [{ x: 260, y: 300 }, { x: 240, y: 300 }];
      d.tubes.find((t) => t.id === 't9')!.lengthM = 0.2;
    });
    expect(rows).toEqual([
      { tag: '1V3:2 – 1A1:B', what: 'Length', before: '0.1 m', after: '0.2 m', affects: 'behaviour' },
      { tag: '1V1', what: 'Label', before: '—', after: 'Two-hand condition', affects: 'drawing' },
      { tag: '1V1', what: 'Position', before: '(240, 360)', after: '(260, 360)', affects: 'drawing' },
      { tag: '1V1', what: 'Rotation', before: '0°', after: '180°', affects: 'drawing' },
      { tag: '1V1:2 – 1V2:14', what: 'Route', before: 'straight', after: '(260, 300) (240, 300)', affects: 'drawing' },
    ]);
  });

  it('shows a changed link by the parts it couples and its stroke position in millimetres', () => {
    const rows = rowsAfter(cartonClamp, (d) => {
      const link = d.links.find((l) => l.id === 'l1')!;
      link.to = 'start';
      link.positionM = 0.045;
    });
    expect(rows).toEqual([
      { tag: '1A1 → 1S1', what: 'To', before: '1S2', after: '1S1', affects: 'behaviour' },
      { tag: '1A1 → 1S1', what: 'Actuating position', before: '50 mm', after: '45 mm', affects: 'behaviour' },
    ]);
  });

  it('shows circuit settings without a tag, ambient pressure absolute', () => {
    const rows = rowsAfter(twoHand, (d) => {
      d.settings.ambientPressurePa = 95_000;
      d.settings.ambientTemperatureK = 303.15;
    });
    expect(rows).toEqual([
      { tag: '', what: 'Ambient pressure', before: '1.01325 bar (absolute)', after: '0.95 bar (absolute)', affects: 'behaviour' },
      { tag: '', what: 'Ambient temperature', before: '20 °C', after: '30 °C', affects: 'behaviour' },
    ]);
  });

  it('shows a parameter only one type has as missing on the other side', () => {
    const rows = rowsAfter(twoHand, (d) => {
      component(d, 'meter').type = 'throttle';
    });
    expect(rows).toEqual([
      { tag: '1V3', what: 'Type', before: 'One-way flow control valve', after: 'Throttle valve', affects: 'behaviour' },
      { tag: '1V3', what: 'Check valve C', before: '1 l/(s·bar)', after: '—', affects: 'behaviour' },
    ]);
  });
});
