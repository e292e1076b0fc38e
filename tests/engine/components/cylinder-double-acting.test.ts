import { describe, expect, it } from 'vitest';
import { crossingTime, cylinderRig, eventTime, eventsOf, lazy, pressFor, runCircuit, strokeTime } from './harness';

const PRESS = 0.3;
const RELEASE = 1.6;
const STROKE = 0.1;
const CUSHION = 0.02;

function run(cushionLength: number) {
  const trace = runCircuit(cylinderRig({ cylinder: { stroke: STROKE, cushionLength } }).build(), pressFor('v', PRESS, RELEASE - PRESS), 3);
  const end = eventTime(trace, 'cyl', 'end-position', PRESS, 'extended');
  const intoLastPart = crossingTime(trace, 'cyl:x', STROKE - CUSHION, 'rising', PRESS);
  if (intoLastPart === undefined) throw new Error('the piston never reached the last part of the stroke');
  return { trace, lastPart: end - intoLastPart, extend: end - PRESS, retract: strokeTime(trace, 'cyl', 'retracted', RELEASE) };
}

describe('cylinder-double-acting', () => {
  const plain = lazy(() => run(0));
  const cushioned = lazy(() => run(CUSHION));

  it('extends on air to A and retracts on air to B', () => {
    expect(plain().extend).toBeLessThan(1);
    expect(plain().retract).toBeLessThan(1);
  });

  it('with cushioning takes clearly longer over the last part of the stroke', () => {
    expect(cushioned().lastPart).toBeGreaterThan(2 * plain().lastPart);
    expect(cushioned().extend).toBeGreaterThan(plain().extend);
    expect(eventsOf(cushioned().trace, 'cyl', 'cushioning', 'rod end').length).toBeGreaterThan(0);
  });

  it('with cushioning takes longer at the cap end of the return stroke too', () => {
    expect(cushioned().retract).toBeGreaterThan(plain().retract);
    expect(eventsOf(cushioned().trace, 'cyl', 'cushioning', 'cap end').length).toBeGreaterThan(0);
  });

  it('reports no cushioning without a cushion length', () => {
    expect(eventsOf(plain().trace, 'cyl', 'cushioning')).toEqual([]);
  });
});
