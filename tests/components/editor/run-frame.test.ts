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
  highestPa: ambient + 6.5e5,
};

const prepared = prepareRun(trace.names, document);
const at = (t: number) => frameAt(prepared, trace, t);

describe('a run on the drawing', () => {
  it('reads the row at or before the playback time, and clamps to the ends of the run', () => {
    expect(at(0.015).t).toBe(0.01);
    expect(at(0.02).t).toBe(0.02);
    expect(at(5).t).toBe(0.02);
    expect(at(-1).t).toBe(0);
  });

  it('gives each tube its gauge pressure in bar, the valve its position, the piston its share of the stroke and the coil its current', () => {
    const frame = at(0.01);
    expect(frame.tubeBar.get('t1')).toBeCloseTo(3, 12);
    expect(frame.components.get(valve)).toEqual({ activePosition: 0 });
    expect(frame.components.get(cylinder)?.extension).toBeCloseTo(0.5, 12); // default stroke 100 mm
    expect(frame.components.get(coil)).toEqual({ energised: false });
    expect(at(0.02).components.get(coil)).toEqual({ energised: true });
  });

  it('scales the colours by the highest pressure the run has reached so far', () => {
    expect(at(0).highestBar).toBeCloseTo(6.5, 12);
  });

  it("starts the colour scale at the supply's set pressure, before the run has got there", () => {
    const supplied = produce(document, (d) => {
      const id = addComponent(d, 'air-supply', { x: 0, y: 200 });
      d.components.find((c) => c.id === id)!.parameters.pressure = 8e5;
    });
    expect(frameAt(prepareRun(trace.names, supplied), trace, 0).highestBar).toBeCloseTo(8, 12);
    expect(frameAt(prepareRun(trace.names, supplied), { ...trace, highestPa: ambient + 9e5 }, 0).highestBar).toBeCloseTo(9, 12);
  });
});

describe('read-outs on the drawing during a run', () => {
  const wired = produce(document, (d) => {
    d.wires.push({ id: 'w1', from: { component: coil, port: 'A1' }, to: { component: coil, port: 'A2' }, bends: [] });
  });
  // The valve's two passages at port 4: one feeding it (towards the port), one exhausting it (away from it).
  const withFlows: RunTrace = {
    ...trace,
    names: [...trace.names, `${valve}:q:1-4`, `${valve}:q:4-5`, 'w1:live'],
    columns: [...trace.columns, Float64Array.from([0, 2.37e-3, 0]), Float64Array.from([0, 0, 1.185e-3]), Float64Array.from([0, 1, 0])],
  };
  const passages = [[5, 1], [6, -1]] as Array<readonly [number, 1 | -1]>;
  const flows = { tubes: { t1: passages }, ports: { [`${valve}:4`]: passages } };
  const at = (t: number) => frameAt(prepareRun(withFlows.names, wired, flows), withFlows, t);

  it('gives the air along a tube and through a port in l/min of free air, signed by direction (ISO 8778: 1.185 kg/m³)', () => {
    // 2.37e-3 kg/s ÷ 1.185 kg/m³ = 2.0e-3 m³/s = 120 l/min.
    expect(at(0.01).tubeFlow.get('t1')).toBeCloseTo(120, 9);
    expect(at(0.02).tubeFlow.get('t1')).toBeCloseTo(-60, 9);
    expect(at(0.01).portFlow.get(`${valve}:4`)).toBeCloseTo(120, 9);
    // A port whose part has no passage onto it has no flow of its own to show.
    expect(at(0.01).portFlow.has(`${valve}:1`)).toBe(false);
  });

  it('gives every reported port its gauge pressure, and marks the wires that are live', () => {
    expect(at(0.01).portBar.get(`${valve}:4`)).toBeCloseTo(3, 12);
    expect(at(0.01).portBar.get(`${valve}:1`)).toBeCloseTo(6.5, 12);
    expect([...at(0.01).liveWires]).toEqual(['w1']);
    expect(at(0.02).liveWires.size).toBe(0);
  });
});
