import { describe, expect, it } from 'vitest';
import type { InputEvent } from '@/engine/solver/simulate';
import { signal, type Trace } from '@/engine/trace/trace';
import { cylinderRig, eventsOf, lamp, meterOut, runCircuit, valueAt as at } from '../components/harness';
import { TestCircuit } from '../support/circuit';

const run = (circuit: TestCircuit, inputs: InputEvent[], untilS: number, intervalS = 0.001): Trace => runCircuit(circuit.build(), inputs, untilS, intervalS);

const press = (t: number, component: string): InputEvent => ({ t, component, action: 'press' });
const release = (t: number, component: string): InputEvent => ({ t, component, action: 'release' });

const SOLENOID_SPRING = { actuation: 'solenoid', returnBy: 'spring' };
const SMALL_CYLINDER = { bore: 0.032, rod: 0.012, stroke: 0.05 };

/**
 * Adds the control supply and, on it, start S1 (NO) in parallel with K1's own NO contact K1a, in
 * series with stop S0 (NC, of type `stop`), feeding K1: the self-holding (latching) rung of every
 * machine control panel (common practice).
 */
function selfHolding(c = new TestCircuit(), stop = 'pushbutton-nc'): TestCircuit {
  return c
    .add('ps', 'dc-supply', {}, 'G1')
    .add('S0', stop)
    .add('S1', 'pushbutton-no')
    .add('K1', 'relay-coil')
    .add('K1a', 'relay-contact-no', { coil: 'K1' })
    .wire('ps:L+', 'S0:11')
    .wire('S0:12', 'S1:13')
    .wire('S0:12', 'K1a:13')
    .wire('S1:14', 'K1:A1')
    .wire('K1a:14', 'K1:A1')
    .wire('K1:A2', 'ps:M');
}

describe('control circuit co-simulation', () => {
  it('self-holding: start latches K1, stop drops it, and stop wins when both are pressed (stop-dominant, common practice)', () => {
    const trace = run(lamp(selfHolding(), 'H1', 'K1:A1'), [press(0.1, 'S1'), release(0.2, 'S1'), press(0.5, 'S0'), release(0.6, 'S0'), press(0.8, 'S1'), press(0.8, 'S0'), release(0.9, 'S1'), release(1.0, 'S0')], 1.2);
    expect(at(trace, 'K1:operated', 0.09)).toBe(0);
    // Pick-up 10 ms: operated by 0.12 s, and still held after the start button is released.
    expect(at(trace, 'K1:operated', 0.12)).toBe(1);
    expect(at(trace, 'K1:operated', 0.45)).toBe(1);
    expect(at(trace, 'H1:lit', 0.45)).toBe(1);
    expect(at(trace, 'K1a:closed', 0.45)).toBe(1);
    // Stop: drops out (5 ms) and stays out after the stop button is released.
    expect(at(trace, 'K1:operated', 0.52)).toBe(0);
    expect(at(trace, 'K1:operated', 0.75)).toBe(0);
    // Both pressed together: K1 never operates.
    for (const t of [0.81, 0.85, 0.95, 1.1]) expect(at(trace, 'K1:operated', t)).toBe(0);
    const k1 = trace.events.filter((e) => e.componentId === 'K1' && e.kind.startsWith('contacts-')).map((e) => `${e.kind}@${e.t.toFixed(3)}`);
    expect(k1).toEqual(['contacts-operated@0.110', 'contacts-returned@0.505']);
  });

  it('two-hand start in series: the solenoid is energised only while both buttons are pressed', () => {
    const circuit = cylinderRig({ valve: SOLENOID_SPRING, cylinder: SMALL_CYLINDER })
      .add('ps', 'dc-supply', {}, 'G1')
      .add('S1', 'pushbutton-no')
      .add('S2', 'pushbutton-no')
      .add('M1', 'solenoid-coil', { valve: 'v', side: '14' }, '1M1')
      .wire('ps:L+', 'S1:13')
      .wire('S1:14', 'S2:13')
      .wire('S2:14', 'M1:A1')
      .wire('M1:A2', 'ps:M');
    const trace = run(circuit, [press(0.1, 'S1'), press(0.3, 'S2'), release(0.6, 'S1'), press(0.8, 'S1'), release(1.0, 'S2'), release(1.0, 'S1')], 1.5);
    const expected: Array<[number, number]> = [[0.05, 0], [0.2, 0], [0.31, 1], [0.55, 1], [0.61, 0], [0.75, 0], [0.81, 1], [0.99, 1], [1.01, 0], [1.4, 0]];
    for (const [t, on] of expected) expect(at(trace, 'M1:energised', t)).toBe(on);
    // The valve follows its coil after its 15 ms switching time, and the cylinder extends.
    expect(at(trace, 'v:position', 0.31)).toBe(1);
    expect(at(trace, 'v:position', 0.32)).toBe(0);
    expect(eventsOf(trace, 'cyl', 'end-position', 'extended')).not.toHaveLength(0);
  });

  it('on-delay and off-delay timer relays switch at their set times, within one output interval', () => {
    const circuit = new TestCircuit()
      .add('ps', 'dc-supply', {}, 'G1')
      .add('S1', 'selector-switch')
      .add('KT1', 'timer-relay-on-delay', { pickUpTime: 0.25 })
      .add('KT2', 'timer-relay-off-delay', { dropOutTime: 0.4 })
      .add('KT1a', 'relay-contact-no', { coil: 'KT1' })
      .add('KT2a', 'relay-contact-no', { coil: 'KT2' })
      .wire('ps:L+', 'S1:13')
      .wire('S1:14', 'KT1:A1')
      .wire('S1:14', 'KT2:A1')
      .wire('KT1:A2', 'ps:M')
      .wire('KT2:A2', 'ps:M')
      .wire('ps:L+', 'KT1a:13')
      .wire('ps:L+', 'KT2a:13');
    const interval = 0.01;
    const trace = run(lamp(lamp(circuit, 'H1', 'KT1a:14'), 'H2', 'KT2a:14'), [{ t: 0.1, component: 'S1', action: 'toggle' }, { t: 1.0, component: 'S1', action: 'toggle' }], 2, interval);
    const edge = (name: string, from: number) => trace.time.find((t, k) => k > 0 && t >= from && signal(trace, name)!.values[k] !== signal(trace, name)!.values[k - 1])!;
    // On-delay: lit 0.25 s after the switch closes; dark at once when it opens.
    expect(Math.abs(edge('H1:lit', 0) - 0.35)).toBeLessThanOrEqual(interval);
    expect(Math.abs(edge('H1:lit', 0.5) - 1.0)).toBeLessThanOrEqual(interval);
    // Off-delay: lit at once; dark 0.4 s after the switch opens.
    expect(Math.abs(edge('H2:lit', 0) - 0.1)).toBeLessThanOrEqual(interval);
    expect(Math.abs(edge('H2:lit', 0.5) - 1.4)).toBeLessThanOrEqual(interval);
    const at1 = eventsOf(trace, 'KT1', 'contacts-operated')[0]!.t;
    const at2 = eventsOf(trace, 'KT2', 'contacts-returned')[0]!.t;
    expect(at1).toBeCloseTo(0.35, 9);
    expect(at2).toBeCloseTo(1.4, 9);
  });

  it('a reciprocating cylinder with a single-solenoid 5/2 valve, two sensors and a counter runs three cycles and stops', () => {
    const circuit = cylinderRig({ valve: SOLENOID_SPRING, cylinder: SMALL_CYLINDER })
      .add('B1', 'proximity-sensor-reed', {}, '1B1')
      .add('B2', 'proximity-sensor-reed', {}, '1B2')
      .link('cyl', 'B1', 0)
      .link('cyl', 'B2', 0.05)
      .add('ps', 'dc-supply', {}, 'G1')
      .add('S1', 'pushbutton-no')
      .add('C1', 'counter', { preset: 3 })
      .add('C1a', 'relay-contact-nc', { coil: 'C1' })
      .add('K1', 'relay-coil')
      .add('K1a', 'relay-contact-no', { coil: 'K1' })
      .add('K1b', 'relay-contact-no', { coil: 'K1' })
      .add('K2', 'relay-coil')
      .add('K2a', 'relay-contact-no', { coil: 'K2' })
      .add('K2b', 'relay-contact-no', { coil: 'K2' })
      .add('K3', 'relay-coil')
      .add('K3a', 'relay-contact-nc', { coil: 'K3' })
      .add('M1', 'solenoid-coil', { valve: 'v', side: '14' }, '1M1')
      // Rung 1: the counter's NC contact, then start or K1's hold, into K1.
      .wire('ps:L+', 'C1a:21')
      .wire('C1a:22', 'S1:13')
      .wire('C1a:22', 'K1a:13')
      .wire('S1:14', 'K1:A1')
      .wire('K1a:14', 'K1:A1')
      .wire('K1:A2', 'ps:M')
      // Rung 2: running and retracted (1B1) sets K2; K2 holds itself until K3 (extended) breaks it.
      .wire('ps:L+', 'K1b:13')
      .wire('K1b:14', 'B1:BN')
      .wire('B1:BU', 'ps:M')
      .wire('B1:BK', 'K2:A1')
      .wire('ps:L+', 'K3a:21')
      .wire('K3a:22', 'K2a:13')
      .wire('K2a:14', 'K2:A1')
      .wire('K2:A2', 'ps:M')
      // Rung 3: extended (1B2) operates K3 and counts.
      .wire('ps:L+', 'B2:BN')
      .wire('B2:BU', 'ps:M')
      .wire('B2:BK', 'K3:A1')
      .wire('K3:A2', 'ps:M')
      .wire('B2:BK', 'C1:A1')
      .wire('C1:A2', 'ps:M')
      // Rung 4: K2 drives the solenoid.
      .wire('ps:L+', 'K2b:13')
      .wire('K2b:14', 'M1:A1')
      .wire('M1:A2', 'ps:M');
    const trace = run(circuit, [press(0.1, 'S1'), release(0.3, 'S1')], 6, 0.005);
    const ends = eventsOf(trace, 'cyl', 'end-position').map((e) => e.detail);
    expect(ends).toEqual(['extended', 'retracted', 'extended', 'retracted', 'extended', 'retracted']);
    expect(eventsOf(trace, 'C1', 'counted').map((e) => e.detail)).toEqual(['1', '2', '3']);
    // Stopped: K1 dropped at the preset and the cylinder rests retracted to the end.
    expect(at(trace, 'K1:operated', 5.9)).toBe(0);
    expect(at(trace, 'cyl:x', 5.9)).toBe(0);
    expect(at(trace, 'C1:count', 5.9)).toBe(3);
  });

  it('an emergency stop de-energises every coil; the valve returns to its spring position and the cylinder retracts', () => {
    const rig = cylinderRig({ valve: SOLENOID_SPRING, cylinder: { ...SMALL_CYLINDER, stroke: 0.2 }, lineB: meterOut('fc', 0.15) });
    const circuit = selfHolding(rig, 'emergency-stop')
      .add('K1b', 'relay-contact-no', { coil: 'K1' })
      .add('M1', 'solenoid-coil', { valve: 'v', side: '14' }, '1M1')
      .wire('S0:12', 'K1b:13')
      .wire('K1b:14', 'M1:A1')
      .wire('M1:A2', 'ps:M');
    const trace = run(circuit, [press(0.1, 'S1'), release(0.2, 'S1'), press(0.5, 'S0'), { t: 1.5, component: 'S0', action: 'toggle' }], 2.5);
    const xAtStop = at(trace, 'cyl:x', 0.5);
    // Struck mid-stroke: the cylinder was on its way out.
    expect(xAtStop).toBeGreaterThan(0.01);
    expect(xAtStop).toBeLessThan(0.19);
    expect(at(trace, 'K1:energised', 0.501)).toBe(0);
    expect(at(trace, 'M1:energised', 0.501)).toBe(0);
    const after = trace.events.filter((e) => e.t >= 0.5).map((e) => `${e.componentId} ${e.kind}${e.detail ? ` ${e.detail}` : ''}`);
    expect(after).toEqual(
      expect.arrayContaining(['S0 struck', 'K1 de-energised', 'M1 de-energised', 'v switched b', 'cyl started retracting', 'cyl end-position retracted', 'S0 reset']),
    );
    // Resetting the stop does not restart the machine: the self-hold was lost.
    expect(at(trace, 'K1:energised', 2.4)).toBe(0);
    expect(at(trace, 'cyl:x', 2.4)).toBe(0);
  });

  it('a relay that breaks its own coil without delay is reported as a race instead of looping', () => {
    const circuit = new TestCircuit()
      .add('ps', 'dc-supply', {}, 'G1')
      .add('K1', 'relay-coil', { pickUpTime: 0, dropOutTime: 0 })
      .add('K1a', 'relay-contact-nc', { coil: 'K1' })
      .wire('ps:L+', 'K1a:21')
      .wire('K1a:22', 'K1:A1')
      .wire('K1:A2', 'ps:M');
    const trace = run(circuit, [], 0.1);
    const race = trace.events.filter((e) => e.kind === 'control-race');
    expect(race).toHaveLength(1);
    expect(race[0]!.t).toBe(0);
    expect(race[0]!.detail).toContain('K1');
    expect(trace.time.at(-1)).toBeCloseTo(0.1, 9);
  });

  it('the same relay with real pick-up and drop-out times buzzes, and the chatter is reported once with its contact', () => {
    const circuit = new TestCircuit()
      .add('ps', 'dc-supply', {}, 'G1')
      .add('K1', 'relay-coil')
      .add('K1a', 'relay-contact-nc', { coil: 'K1' })
      .wire('ps:L+', 'K1a:21')
      .wire('K1a:22', 'K1:A1')
      .wire('K1:A2', 'ps:M');
    const trace = run(circuit, [], 2);
    const chatter = trace.events.filter((e) => e.kind === 'contact-chatter');
    expect(chatter).toHaveLength(1);
    expect(chatter[0]!.detail).toContain('K1');
    expect(chatter[0]!.detail).toContain('K1a');
    // 10 ms in, 5 ms out: one cycle every 15 ms, so some 130 pick-ups in 2 s.
    const operations = eventsOf(trace, 'K1', 'contacts-operated').length;
    expect(operations).toBeGreaterThan(120);
    expect(operations).toBeLessThan(140);
  });

  it('a counter counts pulses to its preset, operates its contacts, ignores pulses while reset and starts again from zero', () => {
    const circuit = new TestCircuit()
      .add('ps', 'dc-supply', {}, 'G1')
      .add('S1', 'pushbutton-no')
      .add('S2', 'pushbutton-no')
      .add('C1', 'counter', { preset: 2 })
      .add('C1a', 'relay-contact-no', { coil: 'C1' })
      .wire('ps:L+', 'S1:13')
      .wire('S1:14', 'C1:A1')
      .wire('C1:A2', 'ps:M')
      .wire('ps:L+', 'S2:13')
      .wire('S2:14', 'C1:R1')
      .wire('C1:R2', 'ps:M')
      .wire('ps:L+', 'C1a:13');
    const pulse = (t: number, button: string) => [press(t, button), release(t + 0.05, button)];
    const trace = run(lamp(circuit, 'H1', 'C1a:14'), [...pulse(0.1, 'S1'), ...pulse(0.3, 'S1'), press(0.5, 'S2'), ...pulse(0.6, 'S1'), release(0.8, 'S2'), ...pulse(1.0, 'S1')], 1.2);
    expect(at(trace, 'C1:count', 0.2)).toBe(1);
    expect(at(trace, 'H1:lit', 0.2)).toBe(0);
    expect(at(trace, 'C1:count', 0.4)).toBe(2);
    expect(at(trace, 'H1:lit', 0.4)).toBe(1);
    // Reset held: back to zero, contacts returned, and a pulse meanwhile is not counted.
    expect(at(trace, 'C1:count', 0.55)).toBe(0);
    expect(at(trace, 'H1:lit', 0.55)).toBe(0);
    expect(at(trace, 'C1:count', 0.7)).toBe(0);
    expect(at(trace, 'C1:count', 1.1)).toBe(1);
    expect(eventsOf(trace, 'C1').map((e) => `${e.kind}${e.detail ? ` ${e.detail}` : ''}`)).toEqual(['counted 1', 'counted 2', 'reset', 'counted 1']);
  });
});
