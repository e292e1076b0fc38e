import { describe, expect, it } from 'vitest';
import { lazy, valueAt } from '../components/harness';
import { clampRig, runWith, strokes, UNTIL_S } from './rigs';

describe('rod seal leak', () => {
  const doc = clampRig().build();
  const healthy = lazy(() => runWith(doc));
  const leaking = lazy(() => runWith(doc, { faultId: 'rod-seal-leak', tag: 'cyl', severity: 2e-9 }));

  it('lowers the rod-end pressure that holds the cylinder retracted', () => {
    // Fed through the flow control's check, the rod end loses air through the seal all the time.
    const at = UNTIL_S - 0.05;
    expect(valueAt(leaking(), 'cyl:p:B', at)).toBeLessThan(valueAt(healthy(), 'cyl:p:B', at) - 5_000);
  });

  it('speeds the metered-out extension, the rod side emptying both ways', () => {
    expect(strokes(leaking()).extend).toBeLessThan(strokes(healthy()).extend * 0.98);
  });
});
