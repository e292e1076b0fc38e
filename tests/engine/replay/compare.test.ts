import { describe, expect, it } from 'vitest';
import type { CircuitDocument } from '@/engine/document/schema';
import { compareRun, ReplayError, type RecordedLog, type RecordedSignal } from '@/engine/replay';
import { pairEdges } from '@/engine/replay/compare';
import type { Trace } from '@/engine/trace/trace';
import { demoDocument } from '@/tests/support/demo-circuits';

const doc: CircuitDocument = demoDocument('lid-press-relay-control');

const N = 301; // 0 … 3 s every 10 ms
const time = Array.from({ length: N }, (_, i) => i / 100);

/** A hand-made trace of the lid press: the reed sensor 1B2 ('down') on over [onS, offS), cap pressure as given. */
function trace(pulses: Array<[number, number]>, capPa: (t: number) => number = () => 101_325): Trace {
  const actuated = time.map((t) => (pulses.some(([on, off]) => t >= on && t < off) ? 1 : 0));
  return {
    formatVersion: 1,
    intervalS: 0.01,
    time,
    signals: [
      { name: 'down:actuated', unit: 'state', values: actuated },
      { name: 'press:p:A', unit: 'Pa', values: time.map(capPa) },
    ],
    events: [],
    stats: { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 },
  };
}

const reed = (times: number[], values: number[]): RecordedSignal => ({ tag: '1B2', word: 'on', role: 'observation', kind: 'state', times, values });
const log = (...signals: RecordedSignal[]): RecordedLog => ({ signals, durationS: 3 });

describe('compareRun on state signals', () => {
  // The model's 1B2 comes on at sample 1.00 s, so its edge sits at 0.995 s (between samples); off at 1.995 s.
  const model = trace([[1, 2]]);

  it('scores a log that agrees 0, with a 100 % match and no divergence', () => {
    const c = compareRun(doc, log(reed([0, 0.995, 1.995], [0, 1, 0])), model);
    expect(c.score).toBeCloseTo(0, 9);
    expect(c.match).toBeCloseTo(100, 6);
    expect(c.firstDivergence).toBeNull();
    const s = c.signals[0]!;
    expect(s.recordedEdges).toEqual([
      { t: 0.995, rising: true },
      { t: 1.995, rising: false },
    ]);
    expect(s.simulatedEdges.map((e) => e.rising)).toEqual([true, false]);
    expect(c.summary).toMatch(/^The model matches 2 of 2 recorded sensor edges within 50 ms; no divergence/);
  });

  it('times a late machine edge (simulated − recorded < 0) and marks it as the first divergence', () => {
    const c = compareRun(doc, log(reed([0, 1.175, 1.995], [0, 1, 0])), model);
    const s = c.signals[0]!;
    expect(s.pairs[0]!.errorMs).toBeCloseTo(-180, 6);
    expect(s.pairs[1]!.errorMs).toBeCloseTo(0, 6);
    expect(s.maxErrorMs).toBeCloseTo(180, 6);
    // Score: the mean of the terms, 180 ms and 0 ms.
    expect(c.score).toBeCloseTo(90, 6);
    expect(c.match).toBeCloseTo(100 * Math.exp(-0.9), 6);
    expect(c.firstDivergence).toMatchObject({ tag: '1B2', word: 'on' });
    expect(c.firstDivergence!.t).toBeCloseTo(0.995, 9);
    expect(c.summary).toBe('The model matches 1 of 2 recorded sensor edges within 50 ms; 1B2 on comes 180 ms later on the machine (1.175 s) than in the model (0.995 s).');
  });

  it('times an early machine edge positively and lets one within 50 ms pass', () => {
    const c = compareRun(doc, log(reed([0, 0.955, 1.895], [0, 1, 0])), model);
    const s = c.signals[0]!;
    expect(s.pairs.map((p) => Math.round(p.errorMs!))).toEqual([40, 100]);
    expect(c.firstDivergence!.t).toBeCloseTo(1.895, 9);
    expect(c.firstDivergence!.description).toMatch(/1B2 no longer on comes 100 ms earlier on the machine/);
  });

  it('caps an edge error at 500 ms', () => {
    const c = compareRun(doc, log(reed([0, 1.895, 2.5], [0, 1, 0])), trace([[1, 2.5]]));
    expect(c.signals[0]!.pairs[0]!.errorMs).toBeCloseTo(-900, 6);
    expect(c.score).toBeCloseTo((500 + 5) / 2, 6);
  });

  it('counts recorded edges the model lacks as missing, each with the cap as penalty', () => {
    const c = compareRun(doc, log(reed([0, 0.995, 1.995, 2.5, 2.7], [0, 1, 0, 1, 0])), model);
    const s = c.signals[0]!;
    expect(s.missing).toBe(2);
    expect(s.extra).toBe(0);
    expect(s.pairs.slice(2)).toEqual([
      { recordedS: 2.5, simulatedS: null, errorMs: null },
      { recordedS: 2.7, simulatedS: null, errorMs: null },
    ]);
    expect(c.score).toBeCloseTo((0 + 0 + 500 + 500) / 4, 6);
    expect(c.firstDivergence).toMatchObject({ t: 2.5, description: '1B2 on at 2.5 s on the machine has no counterpart in the model within 1 s' });
  });

  it('counts model edges the machine did not record as extra, but not those after the log ends', () => {
    const c = compareRun(doc, { signals: [reed([0, 0.995, 1.995], [0, 1, 0])], durationS: 2.6 }, trace([[1, 2], [2.4, 2.8]]));
    const s = c.signals[0]!;
    expect(s.extra).toBe(1);
    expect(s.missing).toBe(0);
    expect(c.firstDivergence!.t).toBeCloseTo(2.395, 9);
    expect(c.firstDivergence!.description).toMatch(/^the model has 1B2 on at 2\.395 s, which the machine did not record/);
    expect(c.score).toBeCloseTo(500 / 3, 6);
  });

  it('does not pair edges of opposite direction or further apart than the window', () => {
    const { pairs, used } = pairEdges(
      [
        { t: 1, rising: true },
        { t: 2, rising: false },
      ],
      [
        { t: 1.05, rising: false },
        { t: 3.5, rising: true },
        { t: 2.2, rising: false },
      ].sort((a, b) => a.t - b.t),
      1,
    );
    expect(pairs[0]!.simulatedS).toBeNull();
    expect(pairs[1]!.simulatedS).toBe(2.2);
    expect(used).toEqual([false, true, false]);
  });

  it('pairs each recorded edge with the nearest simulated one, in order', () => {
    const { pairs } = pairEdges(
      [
        { t: 1, rising: true },
        { t: 1.5, rising: true },
      ],
      [
        { t: 0.6, rising: true },
        { t: 0.95, rising: true },
        { t: 1.6, rising: true },
      ],
      1,
    );
    expect(pairs.map((p) => p.simulatedS)).toEqual([0.95, 1.6]);
  });

  it('flags a different state at the start of the log', () => {
    const c = compareRun(doc, log(reed([0, 0.995, 1.995], [1, 1, 0])), model);
    expect(c.signals[0]!.missing).toBe(1);
    expect(c.firstDivergence).toMatchObject({ t: 0, description: '1B2 is on at the start of the log (0 s), the model is not' });
  });
});

describe('compareRun on numbers', () => {
  const model = trace([], (t) => (t < 1 ? 101_325 : 701_325));
  const cap = (values: (t: number) => number): RecordedSignal => {
    const times = Array.from({ length: 151 }, (_, i) => i * 0.02);
    return { tag: '1A1', word: 'pressure:A', role: 'observation', kind: 'number', times, values: times.map(values) };
  };

  it('passes a pressure within 0.3 bar and reports its RMS error in SI', () => {
    const c = compareRun(doc, log(cap((t) => (t < 1 ? 101_325 : 701_325) + 10_000)), model);
    // Each recorded value is 0.1 bar above the model, except where the model's step at 1 s lies
    // within ±50 ms of the sample: the model passed through 1.11 bar absolute there, so the samples
    // at 0.96 s and 0.98 s are inside its band (those at 1.00…1.04 s, 7.11 bar, are above it).
    // 149 of the 151 samples are 10 000 Pa off.
    const rms = 10_000 * Math.sqrt(149 / 151);
    expect(c.signals[0]!.rmsError).toBeCloseTo(rms, 6);
    expect(c.firstDivergence).toBeNull();
    // An RMS error of a fraction of the tolerance weighs as an edge that fraction × 50 ms off.
    expect(c.score).toBeCloseTo((50 * rms) / 30_000, 6);
    expect(c.summary).toContain('pressure at 1A1.A within 0.10 bar RMS of the model');
  });

  it('marks the first recorded time a pressure is more than 0.3 bar off', () => {
    const c = compareRun(doc, log(cap((t) => (t < 1.5 ? (t < 1 ? 101_325 : 701_325) : 601_325))), model);
    expect(c.firstDivergence!.t).toBeCloseTo(1.5, 9);
    expect(c.firstDivergence!.description).toBe('pressure at 1A1.A differs from the model by 1.00 bar at 1.5 s (tolerance 0.30 bar)');
  });

  it('reads positions in metres with a 2 mm tolerance', () => {
    const withX: Trace = { ...model, signals: [...model.signals, { name: 'press:x', unit: 'm', values: time.map((t) => Math.min(0.1, t * 0.05)) }] };
    const times = [0, 1, 2, 3];
    // Around 1 s the model moves through 47.5…52.5 mm within ±50 ms: 54 mm is 1.5 mm beyond that
    // band, the other samples lie on the model; RMS over the four samples = 1.5 mm / 2.
    const c = compareRun(doc, log({ tag: '1A1', word: 'position', role: 'observation', kind: 'number', times, values: [0, 0.054, 0.1, 0.1] }), withX);
    expect(c.signals[0]!.rmsError).toBeCloseTo(0.00075, 9);
    expect(c.firstDivergence).toBeNull();
  });

  it('counts a value that the model reaches only a little earlier or later as on the model, not as a value error', () => {
    // The machine logged the 6 bar step 30 ms after the model made it: inside the ±50 ms band.
    const late = compareRun(doc, log(cap((t) => (t < 1.03 ? 101_325 : 701_325))), model);
    expect(late.signals[0]!.rmsError).toBe(0);
    expect(late.firstDivergence).toBeNull();
    // 80 ms late is beyond it: at 1.06 s the logged 1 bar is the first sample whose ±50 ms holds only the model's 7 bar.
    const later = compareRun(doc, log(cap((t) => (t < 1.08 ? 101_325 : 701_325))), model);
    expect(later.firstDivergence!.t).toBeCloseTo(1.06, 9);
  });
});

describe('compareRun errors', () => {
  const model = trace([[1, 2]]);
  it.each([
    ['an unknown tag', reed([0], [0]), { tag: '9B9' }, /9B9 'on'.*unknown tag '9B9'/],
    ['a word the part has not', reed([0], [0]), { word: 'extended' }, /1B2 'extended'/],
    ['a number word that is not a measure', { ...reed([0], [0]), kind: 'number' as const }, { word: 'speed' }, /1B2 'speed'.*'position'.*'pressure:<port>'/],
    ['a port the part has not', { ...reed([0], [0]), kind: 'number' as const }, { tag: '1A1', word: 'pressure:Z' }, /1A1 'pressure:Z'.*no air port 'Z'/],
  ])('names the tag and word for %s', (_, signal, change, message) => {
    expect(() => compareRun(doc, log({ ...signal, ...change }), model)).toThrow(message);
  });

  it('needs at least one observation', () => {
    expect(() => compareRun(doc, log({ ...reed([0], [0]), role: 'command' }), model)).toThrow(ReplayError);
  });
});
