import { describe, expect, it } from 'vitest';
import type { TestCircuit } from '../support/circuit';
import { cylinderRig, pressFor, runCircuit, strokeTime } from './harness';

const PRESS = 0.3;
const RELEASE = 1.6;

/** Throttle `th` in the cap-end line; it restricts both filling (extend) and exhausting (retract). */
const throttled = (opening: number) => (c: TestCircuit, valvePort: string, cylinderPort: string) => c.add('th', 'throttle', { opening }).tube(valvePort, 'th:1').tube('th:2', cylinderPort);

function strokes(opening: number) {
  const trace = runCircuit(cylinderRig({ lineA: throttled(opening) }).build(), pressFor('v', PRESS, RELEASE - PRESS), 3);
  return { extend: strokeTime(trace, 'cyl', 'extended', PRESS), retract: strokeTime(trace, 'cyl', 'retracted', RELEASE) };
}

describe('throttle', () => {
  it('a smaller opening gives a longer stroke, both ways (monotonic over three openings)', () => {
    const [wide, half, narrow] = [1, 0.5, 0.2].map(strokes);
    expect(half!.extend).toBeGreaterThan(wide!.extend * 1.05);
    expect(narrow!.extend).toBeGreaterThan(half!.extend * 1.05);
    expect(half!.retract).toBeGreaterThan(wide!.retract * 1.05);
    expect(narrow!.retract).toBeGreaterThan(half!.retract * 1.05);
  });

  it('can be set while running: closing it mid-stroke stops the piston short of the end', () => {
    const trace = runCircuit(cylinderRig({ lineA: throttled(0.5) }).build(), [{ t: PRESS, component: 'v', action: 'press' }, { t: PRESS + 0.03, component: 'th', action: 'set', value: 0 }], 1.5);
    expect(trace.events.filter((e) => e.componentId === 'cyl' && e.kind === 'end-position' && e.detail === 'extended')).toEqual([]);
  });
});
