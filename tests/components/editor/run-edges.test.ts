import { describe, expect, it } from 'vitest';
import type { ConnectionFlowEdge } from '@/components/editor/flow-mapping';
import { rampColour } from '@/components/editor/run/pressure-ramp';
import { edgeInRun } from '@/components/editor/run/run-edges';
import type { RunFrame } from '@/components/editor/run/run-frame';

const edge = (id: string, kind: 'tube' | 'wire'): ConnectionFlowEdge => ({ id, source: 'a', target: 'b', type: 'connection', className: `airproof-${kind}`, data: { kind, bends: [], dots: [] } });
const frame: RunFrame = {
  t: 1,
  components: new Map(),
  tubeBar: new Map([['t1', 3]]),
  tubeFlow: new Map(),
  portBar: new Map(),
  portFlow: new Map(),
  liveWires: new Set(['w1']),
  highestBar: 6,
};

describe('tubes and wires during a run', () => {
  it('colours a tube by its pressure on the ramp, and leaves one the run does not report as drawn', () => {
    expect(edgeInRun(edge('t1', 'tube'), frame, 6).style).toEqual({ stroke: rampColour(0.5), strokeWidth: 3 });
    const unreported = edge('t2', 'tube');
    expect(edgeInRun(unreported, frame, 6)).toBe(unreported);
  });

  it('marks a wire live or dead, keeping its own classes', () => {
    expect(edgeInRun(edge('w1', 'wire'), frame, 6).className).toBe('airproof-wire airproof-wire-live');
    expect(edgeInRun(edge('w2', 'wire'), frame, 6).className).toBe('airproof-wire airproof-wire-dead');
  });
});
