import { describe, expect, it } from 'vitest';
import { clampRig, runWith, strokes } from './rigs';

describe('throttle set differently', () => {
  it('slows the metered-out extension monotonically as the needle is closed', () => {
    const doc = clampRig(0.5).build();
    const openings = [0.5, 0.35, 0.2, 0.1];
    const times = openings.map((opening) => strokes(runWith(doc, { faultId: 'throttle-setting', tag: 'fc', severity: opening })).extend);
    for (let i = 1; i < times.length; i += 1) expect(times[i]!, `opening ${openings[i]}`).toBeGreaterThan(times[i - 1]! * 1.1);
  });
});
