import { describe, expect, it } from 'vitest';
import { LiveTrace } from '@/components/editor/run/live-trace';

const names = ['v:p:4', 'c:x', 'v:position'];

describe('the rows of a live run', () => {
  it('grows column by column as rows arrive, beyond its first capacity', () => {
    const trace = new LiveTrace(names, 0.01, 2);
    trace.append(0, Float64Array.from([0, 0.01]), Float64Array.from([101_325, 0, 1, 201_325, 0.001, 1]));
    trace.append(2, Float64Array.from([0.02, 0.03, 0.04]), Float64Array.from([301_325, 0.002, 0, 401_325, 0.003, 0, 351_325, 0.004, 0]));
    const view = trace.view();
    expect(trace.length).toBe(5);
    expect(trace.lastTime).toBe(0.04);
    expect(Array.from(view.time)).toEqual([0, 0.01, 0.02, 0.03, 0.04]);
    expect(Array.from(view.columns[0]!)).toEqual([101_325, 201_325, 301_325, 401_325, 351_325]);
    expect(Array.from(view.columns[2]!)).toEqual([1, 1, 0, 0, 0]);
    // Single precision: a millimetre of travel to well under a micrometre.
    expect(view.columns[1]![3]).toBeCloseTo(0.003, 9);
  });

  it('keeps the highest port pressure seen so far, and only from pressure columns', () => {
    const trace = new LiveTrace(names, 0.01);
    trace.append(0, Float64Array.from([0]), Float64Array.from([501_325, 9e9, 1]));
    expect(trace.highestPa).toBe(501_325);
    trace.append(1, Float64Array.from([0.01]), Float64Array.from([401_325, 0, 1]));
    expect(trace.view().highestPa).toBe(501_325);
  });

  it('refuses rows that do not follow on, or that do not fill whole rows', () => {
    const trace = new LiveTrace(names, 0.01);
    expect(() => trace.append(1, Float64Array.from([0.01]), Float64Array.from([0, 0, 0]))).toThrow(/expected row 0/);
    expect(() => trace.append(0, Float64Array.from([0]), Float64Array.from([0, 0]))).toThrow(/expected 3 values/);
    expect(trace.length).toBe(0);
  });
});
