import { produce } from 'immer';
import { describe, expect, it } from 'vitest';
import { addComponent, connect } from '@/components/editor/document-commands';
import { frameAt, prepareRun, type RunTrace } from '@/components/editor/run/run-frame';
import { emptyDocument } from '@/engine/document/schema';

const ids: string[] = [];
const document = produce(emptyDocument(), (d) => {
  ids.push(addComponent(d, 'valve-5-2', { x: 0, y: 0 }), addComponent(d, 'cylinder-double-acting', { x: 0, y: -100 }), addComponent(d, 'relay-coil', { x: 200, y: 0 }));
  connect(d, { component: ids[0]!, port: '4' }, { component: ids[1]!, port: 'A' });
});
const [valve, cylinder, coil] = ids as [string, string, string];
const ambient = document.settings.ambientPressurePa;

// Three rows, 10 ms apart: the valve switches, the tube fills, the piston goes out, the coil picks up.
const trace: RunTrace = {
  intervalS: 0.01,
  time: Float64Array.from([0, 0.01, 0.02]),
  names: [`${valve}:p:4`, `${valve}:position`, `${cylinder}:x`, `${coil}:energised`, `${valve}:p:1`],
  columns: [
    Float64Array.from([ambient, ambient + 3e5, ambient + 6e5]),
    Float64Array.from([1, 0, 0]),
    Float64Array.from([0, 0.05, 0.1]),
    Float64Array.from([0, 0, 1]),
    Float64Array.from([ambient + 6.5e5, ambient + 6.5e5, ambient + 6.5e5]),
  ],
};

const prepared = prepareRun(trace, document);

describe('a run on the drawing', () => {
  it('reads the row at or before the playback time, and clamps to the ends of the run', () => {
    expect(frameAt(prepared, 0.015).t).toBe(0.01);
    expect(frameAt(prepared, 0.02).t).toBe(0.02);
    expect(frameAt(prepared, 5).t).toBe(0.02);
    expect(frameAt(prepared, -1).t).toBe(0);
  });

  it('gives each tube its gauge pressure in bar, the valve its position, the piston its share of the stroke and the coil its current', () => {
    const frame = frameAt(prepared, 0.01);
    expect(frame.tubeBar.get('t1')).toBeCloseTo(3, 12);
    expect(frame.components.get(valve)).toEqual({ activePosition: 0 });
    expect(frame.components.get(cylinder)?.extension).toBeCloseTo(0.5, 12); // default stroke 100 mm
    expect(frame.components.get(coil)).toEqual({ energised: false });
    expect(frameAt(prepared, 0.02).components.get(coil)).toEqual({ energised: true });
  });

  it('scales the colours by the highest pressure anywhere in the whole run', () => {
    expect(frameAt(prepared, 0).highestBar).toBeCloseTo(6.5, 12);
  });
});
