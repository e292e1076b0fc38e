import { describe, expect, it } from 'vitest';
import { momentReadout } from '@/components/proof/moment-readout';
import { circuitDocumentSchema } from '@/engine/document/schema';
import type { Trace } from '@/engine/trace/trace';

const document = circuitDocumentSchema.parse({
  schemaVersion: 1,
  components: [
    { id: 'press', type: 'cylinder-double-acting', tag: '1A1', position: { x: 0, y: 0 }, parameters: {} },
    { id: 'left', type: 'valve-3-2-nc', tag: '1S1', position: { x: 0, y: 100 }, parameters: { actuation: 'pushbutton' } },
  ],
  tubes: [],
  wires: [],
});

/** Three samples 0.1 s apart: the piston at rest, then moving out at 50 mm/s, then back at rest further out. */
const trace: Trace = {
  formatVersion: 1,
  intervalS: 0.1,
  time: [0, 0.1, 0.2],
  signals: [
    { name: 'press:x', unit: 'm', values: [0, 0.0025, 0.005] },
    { name: 'press:v', unit: 'm/s', values: [0, 0.05, 0.0004] },
    { name: 'left:operated', unit: 'state', values: [0, 1, 1] },
    // The 3/2 valve's positions are named by its type: 0 'open', 1 'exhausting'.
    { name: 'left:position', unit: 'state', values: [1, 0, 0] },
    { name: 'press:p:A', unit: 'Pa', values: [101325, 300000, 600000] },
  ],
  events: [],
  stats: { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 },
};

describe('momentReadout', () => {
  it("reads the named parts at the last sample at or before t, in mm and words", () => {
    // t = 0.15 s lies between samples 1 and 2: sample 1 (0.1 s) is shown.
    expect(momentReadout(trace, document, ['1A1', '1S1'], 0.15)).toEqual([
      { tag: '1A1', text: 'position 2.5 mm, moving out' },
      { tag: '1S1', text: 'operated yes, in position ‘open’' },
    ]);
  });

  it('calls a piston slower than 1 mm/s still, and clamps t to the run', () => {
    expect(momentReadout(trace, document, ['1A1'], 5)).toEqual([{ tag: '1A1', text: 'position 5.0 mm, still' }]);
    expect(momentReadout(trace, document, ['1S1'], -1)).toEqual([{ tag: '1S1', text: 'operated no, in position ‘exhausting’' }]);
  });

  it('leaves out tags the drawing does not have', () => {
    expect(momentReadout(trace, document, ['9Z9'], 0)).toEqual([]);
  });
});
