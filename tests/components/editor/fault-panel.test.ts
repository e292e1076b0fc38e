import { describe, expect, it } from 'vitest';
import { startingSeverity } from '@/components/editor/run/FaultPanel';
import type { FaultCandidate } from '@/engine/faults';

const candidate = (min: number, max: number, healthy: number): FaultCandidate => ({ faultId: 'x', tag: 'T', label: 'x: T', severity: { min, max, healthy, unit: '', label: '' } });

describe('startingSeverity', () => {
  it('starts halfway from healthy towards the end of the range farther from it', () => {
    // A throttle drawn at 0.4 open, settable 0.05…1: 1 is farther from 0.4 than 0.05, so halfway to 1.
    expect(startingSeverity(candidate(0.05, 1, 0.4), false)).toBeCloseTo(0.7, 12);
    // A supply drawn at 6 bar, settable 2…6 bar: the far end is 2 bar, halfway is 4 bar.
    expect(startingSeverity(candidate(200_000, 600_000, 600_000), false)).toBe(400_000);
    // A leak: healthy 0, worst at the top of the range.
    expect(startingSeverity(candidate(0, 2e-9, 0), false)).toBe(1e-9);
  });

  it('puts an on-or-off fault on', () => {
    expect(startingSeverity(candidate(1, 1, 0), true)).toBe(1);
  });
});
