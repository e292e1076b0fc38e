import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';
import type { Trace } from '@/engine/trace/trace';

/** A small drawing for the rule tests: four push-buttons, a cylinder, a supply, a 5/2 valve with two coils, a semi-rotary actuator. */
export function testDocument(): CircuitDocument {
  const at = { x: 0, y: 0 };
  const part = (id: string, type: string, tag: string, parameters: Record<string, number | string | boolean> = {}) => ({ id, type, tag, parameters, position: at });
  return circuitDocumentSchema.parse({
    schemaVersion: 1,
    components: [
      part('a', 'pushbutton-no', 'A'),
      part('b', 'pushbutton-no', 'B'),
      part('c', 'pushbutton-no', 'C'),
      part('m', 'pushbutton-no', 'M'),
      part('cyl', 'cylinder-double-acting', '1A1', { stroke: 0.1 }),
      part('sup', 'air-supply', '0Z1'),
      part('v', 'valve-5-2', '1V1', { actuation: 'solenoid', returnBy: 'solenoid' }),
      part('m1', 'solenoid-coil', '1M1', { valve: '1V1', side: '14' }),
      part('m2', 'solenoid-coil', '1M2', { valve: '1V1', side: '12' }),
      part('rot', 'semi-rotary-actuator', '2A1', { swivelAngle: Math.PI / 2 }),
      part('k', 'relay-contact-no', 'K1.1', { coil: 'K1' }),
      part('hand', 'valve-3-2-nc', '1S1', { actuation: 'pushbutton' }),
      part('estop', 'emergency-stop', 'S0'),
      part('dc', 'dc-supply', 'G1'),
    ],
    tubes: [{ id: 't1', from: { component: 'sup', port: '2' }, to: { component: 'v', port: '1' }, lengthM: 1, innerDiameterM: 0.004 }],
  });
}

/** A trace built by hand: sample times and the columns the test needs. */
export function handTrace(time: number[], columns: Record<string, number[]>): Trace {
  for (const [name, values] of Object.entries(columns)) if (values.length !== time.length) throw new Error(`column ${name} has ${values.length} samples, not ${time.length}`);
  return {
    formatVersion: 1,
    intervalS: time.length > 1 ? time[1]! - time[0]! : 0,
    time,
    signals: Object.entries(columns).map(([name, values]) => ({ name, unit: name.endsWith(':x') ? 'm' : name.endsWith(':v') ? 'm/s' : name.includes(':p:') ? 'Pa' : 'state', values })),
    events: [],
    stats: { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 },
  };
}

/** Samples at 0, 0.1 … 1.0 s, written out so that window edges fall exactly on samples. */
export const TENTHS = [0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1.0];

/** A 0/1 column over TENTHS that is 1 at the given sample indices. */
export function pulses(...on: number[]): number[] {
  return TENTHS.map((_, i) => (on.includes(i) ? 1 : 0));
}
