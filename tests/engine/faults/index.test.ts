import { describe, expect, it } from 'vitest';
import type { CircuitDocument } from '@/engine/document/schema';
import { applyFault, applyFaults, FAULT_TYPES, faultsFor } from '@/engine/faults';
import { clampRig, CYCLE, UNTIL_S } from './rigs';
import { pressFor, runCircuit } from '../components/harness';

/** Both valves worked over the cycle, so that every part carries air at some time. */
const INPUTS = [...CYCLE, ...pressFor('v2', 0.1, 1.4)];

/** The clamp rig plus a throttle in a pilot-free branch and a single-acting cylinder, so every fault type has a part. */
function everyPart(): CircuitDocument {
  return clampRig()
    .add('v2', 'valve-3-2-nc')
    .add('thr', 'throttle')
    .add('cyl2', 'cylinder-single-acting')
    .tube('sup:2', 'v2:1')
    .tube('v2:2', 'thr:1')
    .tube('thr:2', 'cyl2:A')
    .build();
}

describe('fault library', () => {
  it('has unique ids, and ranges that hold their healthy value', () => {
    expect(new Set(FAULT_TYPES.map((f) => f.id)).size).toBe(FAULT_TYPES.length);
    for (const f of FAULT_TYPES) {
      if (f.onOff) expect([f.severity.min, f.severity.max, f.severity.healthy], f.id).toEqual([1, 1, 0]);
      else expect(f.severity.min <= f.severity.healthy && f.severity.healthy <= f.severity.max, f.id).toBe(true);
    }
  });

  it('offers each fault on the parts it can happen on', () => {
    const offered = faultsFor(everyPart()).map((f) => `${f.faultId} ${f.tag}`);
    for (const expected of [
      'piston-seal-leak cyl',
      'piston-seal-leak cyl2',
      'rod-seal-leak cyl',
      'tube-leak t0',
      'throttle-setting fc',
      'throttle-setting thr',
      'spring-weakened cyl2',
      'spool-sticking v',
      'spool-stuck v2',
      'sensor-shifted B1',
      'sensor-failed B1',
      'supply-low sup',
      'silencer-clogged sil',
    ])
      expect(offered).toContain(expected);
    for (const absent of ['rod-seal-leak cyl2', 'spring-weakened cyl', 'sensor-failed H1', 'spool-stuck fc', 'throttle-setting sil']) expect(offered).not.toContain(absent);
  });

  it("takes the healthy value from the drawing: a throttle's own opening, the supply's own pressure", () => {
    const doc = clampRig(0.42).build();
    const throttle = faultsFor(doc).find((f) => f.faultId === 'throttle-setting' && f.tag === 'fc')!;
    expect(throttle.severity.healthy).toBe(0.42);
    const supply = faultsFor(doc).find((f) => f.faultId === 'supply-low')!;
    expect(supply.severity).toMatchObject({ healthy: 600_000, max: 600_000, min: 200_000, unit: 'Pa' });
  });

  it('never changes the document it is given', () => {
    const doc = everyPart();
    const before = JSON.stringify(doc);
    for (const f of faultsFor(doc)) applyFault(doc, { faultId: f.faultId, tag: f.tag, severity: f.severity.max });
    expect(JSON.stringify(doc)).toBe(before);
  });

  it('at the healthy severity gives the unfaulted run bit for bit, for every fault on every part', () => {
    const doc = everyPart();
    const healthy = runCircuit(doc, INPUTS, UNTIL_S);
    const candidates = faultsFor(doc);
    expect(candidates.length).toBeGreaterThan(20);
    for (const f of candidates) {
      const trace = runCircuit(applyFault(doc, { faultId: f.faultId, tag: f.tag, severity: f.severity.healthy }), INPUTS, UNTIL_S);
      expect(trace, `${f.faultId} on ${f.tag}`).toEqual(healthy);
    }
  });

  it('at its worst changes the run, for every fault on every part (so the comparison above can fail)', () => {
    const doc = everyPart();
    const healthy = runCircuit(doc, INPUTS, UNTIL_S);
    for (const f of faultsFor(doc)) {
      const worst = f.severity.max === f.severity.healthy ? f.severity.min : f.severity.max;
      const trace = runCircuit(applyFault(doc, { faultId: f.faultId, tag: f.tag, severity: worst }), INPUTS, UNTIL_S);
      expect(trace, `${f.faultId} on ${f.tag}`).not.toEqual(healthy);
    }
  });

  it('applies several faults in order and rejects unknown faults and parts', () => {
    const doc = clampRig().build();
    const both = applyFaults(doc, [
      { faultId: 'throttle-setting', tag: 'fc', severity: 0.1 },
      { faultId: 'supply-low', tag: 'sup', severity: 400_000 },
    ]);
    expect(both.components.find((c) => c.tag === 'fc')!.parameters.opening).toBe(0.1);
    expect(both.components.find((c) => c.tag === 'sup')!.parameters.pressure).toBe(400_000);
    expect(() => applyFault(doc, { faultId: 'gremlins', tag: 'fc', severity: 1 })).toThrow(/unknown fault/);
    expect(() => applyFault(doc, { faultId: 'spring-weakened', tag: 'cyl', severity: 0.5 })).toThrow(/does not apply to cyl/);
    expect(() => applyFault(doc, { faultId: 'tube-leak', tag: 'nope', severity: 1e-9 })).toThrow(/no tube/);
  });

  it('keeps a severity outside the parameter limits to the limit, so the drawing still compiles', () => {
    const doc = applyFault(clampRig().build(), { faultId: 'throttle-setting', tag: 'fc', severity: 1.7 });
    expect(doc.components.find((c) => c.tag === 'fc')!.parameters.opening).toBe(1);
  });

  it('describes each fault in plain words with the units a technician reads', () => {
    const text = (id: string, tag: string, severity: number) => FAULT_TYPES.find((f) => f.id === id)!.describe(tag, severity);
    expect(text('supply-low', '0Z1', 400_000)).toContain('4.00 bar gauge');
    expect(text('sensor-shifted', '1B2', -0.005)).toContain('5.0 mm towards the retracted end');
    expect(text('spool-sticking', '1V1', 0.25)).toContain('250 ms');
    expect(text('throttle-setting', '1V2', 0.4)).toContain('40 % open');
    expect(text('piston-seal-leak', '1A1', 1e-9)).toContain('0.1 l/(s·bar)');
  });
});
