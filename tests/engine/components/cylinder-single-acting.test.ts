import { describe, expect, it } from 'vitest';
import { eventTime, pressFor, pushbutton, runCircuit, valueAt, withSupply } from './harness';

const STROKE = 0.05;

describe('cylinder-single-acting', () => {
  it('extends on air and returns by its spring when the air is exhausted', () => {
    const doc = pushbutton(withSupply(6), 'pb', 'sup:2').add('cyl', 'cylinder-single-acting', { stroke: STROKE }).tube('pb:2', 'cyl:A').build();
    const trace = runCircuit(doc, pressFor('pb', 0.1, 0.9), 2);
    const out = eventTime(trace, 'cyl', 'end-position', 0.1, 'extended');
    expect(out).toBeLessThan(1);
    expect(valueAt(trace, 'cyl:x', 0.95)).toBeCloseTo(STROKE, 6);
    const back = eventTime(trace, 'cyl', 'end-position', 1, 'retracted');
    expect(back).toBeLessThan(1.95);
    expect(valueAt(trace, 'cyl:x', 1.95)).toBeCloseTo(0, 6);
  });

  it('stays retracted when the air is too weak to beat the spring preload', () => {
    // 25 mm bore: 0.05 bar gives about 2.5 N against a 20 N preload.
    const doc = pushbutton(withSupply(0.05), 'pb', 'sup:2').add('cyl', 'cylinder-single-acting').tube('pb:2', 'cyl:A').build();
    const trace = runCircuit(doc, [{ t: 0.1, component: 'pb', action: 'press' }], 1);
    expect(trace.events.filter((e) => e.componentId === 'cyl' && e.kind === 'started')).toEqual([]);
    expect(valueAt(trace, 'cyl:x', 0.95)).toBe(0);
  });
});
