import { describe, expect, it } from 'vitest';
import { eventsOf, rangeOver } from '../components/harness';
import { clampRig, runWith, UNTIL_S } from './rigs';

describe('spool stuck', () => {
  const doc = clampRig().build();

  it('never moves the cylinder, while the healthy valve strokes it out and back', () => {
    expect(rangeOver(runWith(doc), 'cyl:x', 0, UNTIL_S).max).toBeGreaterThan(0.09);
    const stuck = runWith(doc, { faultId: 'spool-stuck', tag: 'v', severity: 1 });
    expect(rangeOver(stuck, 'cyl:x', 0, UNTIL_S).max).toBe(0);
    expect(rangeOver(stuck, 'v:position', 0, UNTIL_S)).toEqual({ min: 1, max: 1 });
    expect(eventsOf(stuck, 'v', 'switched')).toHaveLength(0);
    // The press and the release are both there, and both said to be lost on the stuck spool.
    expect(eventsOf(stuck, 'v', 'input-ignored', 'spool stuck')).toHaveLength(2);
  });
});
