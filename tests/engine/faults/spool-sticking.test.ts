import { describe, expect, it } from 'vitest';
import { applyFault } from '@/engine/faults';
import { eventTime, pressFor, runCircuit } from '../components/harness';
import { clampRig } from './rigs';

/** Pressed once every line has filled from the start, so both runs switch from the same state. */
const PRESS_S = 1;

describe('spool sticking', () => {
  it('delays the switching, and so the whole stroke, by the extra switching time', () => {
    const doc = clampRig().build();
    const run = (s: number) => runCircuit(applyFault(doc, { faultId: 'spool-sticking', tag: 'v', severity: s }), pressFor('v', PRESS_S, 1), 2.5);
    const switchAt = (s: number) => eventTime(run(s), 'v', 'switched', PRESS_S);
    const extendedAt = (s: number) => eventTime(run(s), 'cyl', 'end-position', PRESS_S, 'extended');
    // The default switching time is 15 ms.
    expect(switchAt(0.3) - switchAt(0.015)).toBeCloseTo(0.285, 6);
    // The stroke after the switch is the same, so only the start moves (to the solver's tolerance, 1 ms).
    expect(Math.abs(extendedAt(0.3) - extendedAt(0.015) - 0.285)).toBeLessThan(0.001);
  });
});
