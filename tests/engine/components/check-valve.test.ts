import { describe, expect, it } from 'vitest';
import { portBar, runCircuit, valueAt, withSupply } from './harness';

/** Supply `sup` → check valve `cv` (1→2) → reservoir `res` (0.1 L) on port 2. */
const doc = (supplyBar: number, crackingPa?: number) =>
  withSupply(supplyBar)
    .add('cv', 'check-valve', crackingPa === undefined ? {} : { crackingPressure: crackingPa })
    .add('res', 'reservoir', { volume: 1e-4 })
    .tube('sup:2', 'cv:1')
    .tube('cv:2', 'res:1')
    .build();

describe('check-valve', () => {
  it('passes 1→2 once the difference exceeds the cracking pressure, up to supply minus cracking', () => {
    // Default cracking pressure 0.1 bar: a 0.3 bar supply fills port 2 to about 0.2 bar.
    const trace = runCircuit(doc(0.3), [], 1.5);
    expect(Math.abs(portBar(trace, 'cv', '2', 1.45) - 0.2)).toBeLessThan(0.02);
  });

  it('stays shut below the cracking pressure', () => {
    const trace = runCircuit(doc(0.05), [], 1);
    expect(Math.abs(portBar(trace, 'cv', '2', 0.95))).toBeLessThan(0.005);
    expect(Math.abs(portBar(trace, 'cv', '1', 0.95) - 0.05)).toBeLessThan(0.005);
  });

  it('opens at a higher setting only above that setting', () => {
    const trace = runCircuit(doc(1, 50_000), [], 1.5);
    expect(Math.abs(portBar(trace, 'cv', '2', 1.45) - 0.5)).toBeLessThan(0.03);
  });

  it('blocks 2→1: a charged reservoir on 2 keeps its air when the supply is lost', () => {
    const trace = runCircuit(doc(6), [{ t: 1, component: 'sup', action: 'set', value: 0 }], 2.5);
    const charged = portBar(trace, 'cv', '2', 0.95);
    expect(charged).toBeGreaterThan(5.8);
    expect(portBar(trace, 'cv', '1', 2.45)).toBeLessThan(0.05);
    expect(Math.abs(portBar(trace, 'cv', '2', 2.45) - charged)).toBeLessThan(0.01);
    expect(Math.abs(valueAt(trace, 'cv:q:check', 2.45))).toBeLessThan(1e-9);
  });
});
