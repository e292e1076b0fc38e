import { describe, expect, it } from 'vitest';
import type { InputEvent } from '@/engine/solver/simulate';
import { TestCircuit } from '../support/circuit';
import { bar, cylinderRig, eventsOf, lamp, meterOut, portBar, pressFor, runCircuit, valueAt } from './harness';

const stuck = (component: string, t: number, value: 1 | 0 | -1): InputEvent => ({ t, component, action: 'set', parameter: 'stuck', value });

/** A 100 mm cylinder that goes out at 0.1 s and back at 1.5 s, and a 24 V supply `ps`. */
const stroke = (): TestCircuit => cylinderRig({ cylinder: { bore: 0.032, rod: 0.012, stroke: 0.1 }, lineB: meterOut('fc', 0.2) }).add('ps', 'dc-supply');
const cycle = pressFor('v', 0.1, 1.4);

describe('sensor failures (set stuck)', () => {
  it('a reed sensor stuck on reads actuated wherever the piston is, stuck off never, and works again at -1', () => {
    const circuit = stroke().add('B1', 'proximity-sensor-reed').link('cyl', 'B1', 0.1).wire('ps:L+', 'B1:BN').wire('B1:BU', 'ps:M');
    const doc = lamp(circuit, 'H1', 'B1:BK').build();
    // Working: lit only while the piston is out (about 0.3 s .. 1.6 s).
    const healthy = runCircuit(doc, cycle, 3);
    expect([0.05, 1, 2.5].map((t) => valueAt(healthy, 'H1:lit', t))).toEqual([0, 1, 0]);

    const failed = runCircuit(doc, [...cycle, stuck('B1', 0.05, 1), stuck('B1', 1.0, 0), stuck('B1', 2.0, -1)], 3);
    // Stuck on at 0.05 s with the piston in; stuck off at 1 s with it out; working at 2 s with it in again.
    expect([0.04, 0.07, 0.95, 1.05, 1.45, 2.5].map((t) => valueAt(failed, 'H1:lit', t))).toEqual([0, 1, 1, 0, 0, 0]);
    expect(eventsOf(failed, 'B1').map((e) => e.kind).filter((k) => k.startsWith('stuck') || k === 'working')).toEqual(['stuck-on', 'stuck-off', 'working']);
  });

  it('a sensor that starts working again while the piston is in its window reads actuated at once', () => {
    const circuit = stroke().add('B1', 'proximity-sensor-inductive').link('cyl', 'B1', 0.1).wire('ps:L+', 'B1:BN').wire('B1:BU', 'ps:M');
    const doc = lamp(circuit, 'H1', 'B1:BK').build();
    const trace = runCircuit(doc, [...cycle, stuck('B1', 0.05, 0), stuck('B1', 1.0, -1)], 3);
    expect([0.95, 1.05, 2.5].map((t) => valueAt(trace, 'H1:lit', t))).toEqual([0, 1, 0]);
  });

  it('a limit switch stuck on changes over its contact (14 made, 12 open) with the piston away', () => {
    const circuit = stroke().add('LS', 'limit-switch').link('cyl', 'LS', 0.06).wire('ps:L+', 'LS:11');
    const doc = lamp(lamp(circuit, 'H1', 'LS:14'), 'H2', 'LS:12').build();
    const trace = runCircuit(doc, [stuck('LS', 0.2, 1)], 0.5);
    expect([valueAt(trace, 'H1:lit', 0.1), valueAt(trace, 'H2:lit', 0.1)]).toEqual([0, 1]);
    expect([valueAt(trace, 'H1:lit', 0.3), valueAt(trace, 'H2:lit', 0.3)]).toEqual([1, 0]);
  });

  it('a pressure switch stuck off ignores 6 bar, stuck on operates at 0 bar', () => {
    const circuit = new TestCircuit()
      .add('ps', 'dc-supply')
      .add('sup', 'air-supply', { pressure: bar(6) })
      .add('PS', 'pressure-switch', { setPressure: bar(4) })
      .tube('sup:2', 'PS:1')
      .wire('ps:L+', 'PS:11');
    const doc = lamp(circuit, 'H1', 'PS:14').build();
    const trace = runCircuit(
      doc,
      [stuck('PS', 0.1, 0), stuck('PS', 0.2, -1), { t: 0.3, component: 'sup', action: 'set', value: 0 }, stuck('PS', 0.4, 1)],
      0.5,
    );
    expect([0.05, 0.15, 0.25, 0.35, 0.45].map((t) => valueAt(trace, 'H1:lit', t))).toEqual([1, 0, 1, 0, 1]);
  });
});

describe('loss of control power (dc-supply set power)', () => {
  it('drops every load — relay, solenoid, lamp — and they pick up again when it returns', () => {
    // S1 held closed feeds relay K1, whose contact feeds solenoid 1M1 of the 5/2 valve and lamp H1.
    const doc = cylinderRig({ valve: { actuation: 'solenoid', returnBy: 'spring' }, cylinder: { bore: 0.032, rod: 0.012, stroke: 0.05 } })
      .add('ps', 'dc-supply')
      .add('S1', 'selector-switch')
      .add('K1', 'relay-coil')
      .add('K1.1', 'relay-contact-no', { coil: 'K1' })
      .add('M1', 'solenoid-coil', { valve: 'v', side: '14' })
      .add('H1', 'indicator-lamp')
      .wire('ps:L+', 'S1:13')
      .wire('S1:14', 'K1:A1')
      .wire('K1:A2', 'ps:M')
      .wire('ps:L+', 'K1.1:13')
      .wire('K1.1:14', 'M1:A1')
      .wire('M1:A2', 'ps:M')
      .wire('K1.1:14', 'H1:X1')
      .wire('H1:X2', 'ps:M')
      .build();
    const power = (t: number, value: number): InputEvent => ({ t, component: 'ps', action: 'set', parameter: 'power', value });
    const trace = runCircuit(doc, [{ t: 0.05, component: 'S1', action: 'press' }, power(1, 0), power(2, 1)], 3);
    const states = (t: number) => ['K1:energised', 'M1:energised', 'H1:lit', 'v:position'].map((name) => valueAt(trace, name, t));
    const on = states(0.9);
    expect(on.slice(0, 3)).toEqual([1, 1, 1]);
    const off = states(1.5);
    expect(off.slice(0, 3)).toEqual([0, 0, 0]);
    expect(off[3]).not.toBe(on[3]);
    expect(states(2.9)).toEqual(on);
    // The cylinder follows: out, back while the power is off, out again.
    expect(valueAt(trace, 'cyl:x', 0.9)).toBeCloseTo(0.05, 4);
    expect(valueAt(trace, 'cyl:x', 1.9)).toBeCloseTo(0, 4);
    expect(valueAt(trace, 'cyl:x', 2.9)).toBeCloseTo(0.05, 4);
    expect(eventsOf(trace, 'ps').map((e) => e.kind).filter((k) => k.startsWith('power'))).toEqual(['power-lost', 'power-restored']);
  });
});

describe('loss of supply air (air-supply set pressure 0)', () => {
  it('vents a cylinder held out by a detented valve to 0 bar gauge on both sides, also behind a receiver and a delivery limit', () => {
    const supplies: Array<Record<string, number>> = [{}, { receiverVolume: 0.0005, deliveryLimit: 0.01 }];
    for (const supply of supplies) {
      const doc = new TestCircuit()
        .add('sup', 'air-supply', { pressure: bar(6), ...supply })
        .add('v', 'valve-5-2', { actuation: 'pushbutton', returnBy: 'detent' })
        .add('cyl', 'cylinder-double-acting', { bore: 0.032, rod: 0.012, stroke: 0.05 })
        .tube('sup:2', 'v:1')
        .tube('v:4', 'cyl:A')
        .tube('v:2', 'cyl:B')
        .build();
      const trace = runCircuit(doc, [{ t: 0.05, component: 'v', action: 'press' }, { t: 1, component: 'sup', action: 'set', value: 0 }], 4);
      expect(portBar(trace, 'cyl', 'A', 0.95)).toBeGreaterThan(5.5);
      // Gauge pressures after the loss: everything upstream of the cylinder back at ambient.
      for (const port of ['A', 'B']) expect(Math.abs(portBar(trace, 'cyl', port, 3.95))).toBeLessThan(0.01);
      expect(Math.abs(portBar(trace, 'v', '1', 3.95))).toBeLessThan(0.01);
    }
  });
});
