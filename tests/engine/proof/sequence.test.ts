import { describe, expect, it } from 'vitest';
import { observedSequence } from '@/engine/proof/sequence';
import { type CircuitDocument } from '@/engine/document/schema';
import { compile } from '@/engine/solver/compile';
import { simulate } from '@/engine/solver/simulate';
import { TRACE_FORMAT_VERSION, type Trace, type TraceEvent } from '@/engine/trace/trace';
import { TestCircuit } from '../support/circuit';
import { demoDocument, demoInputs } from '@/tests/support/demo-circuits';

/** A trace sampled every 0.1 s from position functions (m) of the given components, with the given events. */
function handTrace(untilS: number, positions: Record<string, (t: number) => number>, events: TraceEvent[]): Trace {
  const time = Array.from({ length: Math.round(untilS / 0.1) + 1 }, (_, i) => Math.round(i * 100) / 1000);
  return {
    formatVersion: TRACE_FORMAT_VERSION,
    intervalS: 0.1,
    time,
    signals: Object.entries(positions).map(([id, x]) => ({ name: `${id}:x`, unit: 'm' as const, values: time.map(x) })),
    events,
    stats: { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 },
  };
}

/** Piecewise-linear position through the given [t, x] corners, constant outside them. */
const ramp =
  (...corners: Array<[number, number]>) =>
  (t: number) => {
    if (t <= corners[0]![0]) return corners[0]![1];
    for (let i = 1; i < corners.length; i += 1) {
      const [t0, x0] = corners[i - 1]!;
      const [t1, x1] = corners[i]!;
      if (t <= t1) return x0 + ((x1 - x0) * (t - t0)) / (t1 - t0);
    }
    return corners[corners.length - 1]![1];
  };

// Two cylinders: "b" (tag 2A1, 200 mm) listed before "a" (tag 1A1, 100 mm) to check the tag order of the rows.
const twoCylinders: CircuitDocument = new TestCircuit()
  .add('b', 'cylinder-double-acting', { stroke: 0.2 }, '2A1')
  .add('a', 'cylinder-double-acting', { stroke: 0.1 }, '1A1')
  .add('s1', 'pushbutton-no', {}, 'S1')
  .add('b2', 'proximity-sensor-reed', {}, '1B2')
  .build();

describe('observedSequence on hand-built traces', () => {
  // Events (s): 0.1 S1 pressed; 0.2 1A1 starts out; 0.6 2A1 starts out; 1.0 1A1 extended (1B2 on
  // 0.4 ms later: same instant); 1.4 2A1 extended; 1.6 S1 released; 1.7 1A1 starts in and 2A1
  // 0.5 ms later (one instant); 2.0 1A1 stops at 50 mm; 2.2 2A1 retracted. Run ends at 2.5 s.
  // Boundaries: 0.2, 0.6, 1.0, 1.4, 1.7, 2.0, 2.2, so by hand:
  //   step 0  0   – 0.2  nothing moves                        trigger none
  //   step 1  0.2 – 0.6  1A1 out 0 → mid (level 0.5)           "S1 pressed"
  //   step 2  0.6 – 1.0  1A1 out mid → 1, 2A1 out 0 → mid (0.5) none observed (no edge since 0.2, no arrival at 0.2)
  //   step 3  1.0 – 1.4  2A1 out mid → 1                       "1A1 reached its end (extended)"
  //   step 4  1.4 – 1.7  dwell                                 "2A1 reached its end (extended)"
  //   step 5  1.7 – 2.0  1A1 in 1 → mid (0.5), 2A1 in 1 → mid  "S1 released"
  //       (2A1 at 2.0: 0.2 m − 0.3/0.5 · 0.2 m = 0.08 m, level 0.4)
  //   step 6  2.0 – 2.2  2A1 in mid (0.4) → 0                   "1A1 stopped between its ends"
  // After 2.2 all rest: no further step.
  const trace = handTrace(
    2.5,
    { a: ramp([0.2, 0], [1.0, 0.1], [1.7, 0.1], [2.0, 0.05]), b: ramp([0.6, 0], [1.4, 0.2], [1.7, 0.2], [2.2, 0]) },
    [
      { t: 0.1, componentId: 's1', kind: 'input-press' },
      { t: 0.2, componentId: 'a', kind: 'started', detail: 'extending' },
      { t: 0.6, componentId: 'b', kind: 'started', detail: 'extending' },
      { t: 1.0, componentId: 'a', kind: 'end-position', detail: 'extended' },
      { t: 1.0004, componentId: 'b2', kind: 'actuated' },
      { t: 1.4, componentId: 'b', kind: 'end-position', detail: 'extended' },
      { t: 1.6, componentId: 's1', kind: 'input-release' },
      { t: 1.7, componentId: 'a', kind: 'started', detail: 'retracting' },
      { t: 1.7005, componentId: 'b', kind: 'started', detail: 'retracting' },
      { t: 2.0, componentId: 'a', kind: 'stopped', detail: 'at 50.0 mm' },
      { t: 2.2, componentId: 'b', kind: 'end-position', detail: 'retracted' },
    ],
  );
  const sequence = observedSequence(twoCylinders, trace);

  it('lists the actuators by tag with their start position', () => {
    expect(sequence.actuators).toEqual([
      { componentId: 'a', tag: '1A1', label: 'Double-acting cylinder', initial: 0, initialLevel: 0 },
      { componentId: 'b', tag: '2A1', label: 'Double-acting cylinder', initial: 0, initialLevel: 0 },
    ]);
  });

  it('cuts steps where a motion starts or ends, joining instants within a millisecond', () => {
    expect(sequence.steps.map((s) => [s.index, s.startS, s.endS])).toEqual([
      [0, 0, 0.2],
      [1, 0.2, 0.6],
      [2, 0.6, 1.0],
      [3, 1.0, 1.4],
      [4, 1.4, 1.7],
      [5, 1.7, 2.0],
      [6, 2.0, 2.2],
    ]);
  });

  it('gives each step its motions, with intermediate levels read from the position signals', () => {
    const motions = sequence.steps.map((s) => s.motions.map((m) => `${m.tag} ${m.direction} ${m.from}→${m.to}`));
    expect(motions).toEqual([
      [],
      ['1A1 out 0→mid'],
      ['1A1 out mid→1', '2A1 out 0→mid'],
      ['2A1 out mid→1'],
      [],
      ['1A1 in 1→mid', '2A1 in 1→mid'],
      ['2A1 in mid→0'],
    ]);
    expect(sequence.steps[1]!.motions[0]!.toLevel).toBeCloseTo(0.5, 9);
    expect(sequence.steps[2]!.motions[0]!.fromLevel).toBeCloseTo(0.5, 9);
    expect(sequence.steps[2]!.motions[1]!.toLevel).toBeCloseTo(0.5, 9);
    expect(sequence.steps[5]!.motions[0]!.toLevel).toBeCloseTo(0.5, 9);
    expect(sequence.steps[5]!.motions[1]!.toLevel).toBeCloseTo(0.4, 9);
    expect(sequence.steps[6]!.motions[0]!.fromLevel).toBeCloseTo(0.4, 9);
  });

  it('names the observed transition that opened each step', () => {
    expect(sequence.steps.map((s) => s.trigger)).toEqual([
      null,
      'S1 pressed',
      null,
      '1A1 reached its end (extended)',
      '2A1 reached its end (extended)',
      'S1 released',
      '1A1 stopped between its ends',
    ]);
    expect(sequence.steps.map((s) => s.cause?.tag ?? null)).toEqual([null, 'S1', null, '1A1', '2A1', 'S1', '1A1']);
  });

  it('ends with an open step when the run stops while an actuator moves, and reads an extended start', () => {
    // 1A1 starts extended (x = 0.1 m = its stroke); 2A1 retracted. At 0.3 s a sensor edge, at
    // 0.4 s 1A1 starts in; the run ends at 1.0 s with 1A1 at 0.1 − 0.6/1.2 · 0.1 = 0.05 m.
    // So: step 0 0–0.4, step 1 0.4–1.0 "1B2 on", 1A1 in 1 → mid (0.5).
    const open = observedSequence(
      twoCylinders,
      handTrace(1.0, { a: ramp([0.4, 0.1], [1.6, 0]), b: () => 0 }, [
        { t: 0.3, componentId: 'b2', kind: 'actuated' },
        { t: 0.4, componentId: 'a', kind: 'started', detail: 'retracting' },
      ]),
    );
    expect(open.actuators.map((a) => [a.tag, a.initial])).toEqual([
      ['1A1', 1],
      ['2A1', 0],
    ]);
    expect(open.steps.map((s) => [s.index, s.startS, s.endS, s.trigger])).toEqual([
      [0, 0, 0.4, null],
      [1, 0.4, 1.0, '1B2 on'],
    ]);
    expect(open.steps[1]!.motions).toHaveLength(1);
    expect(open.steps[1]!.motions[0]).toMatchObject({ tag: '1A1', direction: 'in', from: 1, to: 'mid' });
    expect(open.steps[1]!.motions[0]!.toLevel).toBeCloseTo(0.5, 9);
  });

  it('starts a motion from where the actuator stopped, and reads a roller valve as a sensor', () => {
    // 1A1 goes out from 0.2 s, sticks at 50 mm at 0.6 s; roller valve 1S2 is actuated at 0.7 s;
    // 1A1 sets off again at 0.8 s and is extended at 1.0 s. By hand:
    //   step 1 0.2–0.6 out 0 → mid (0.5), no trigger observed; step 2 0.6–0.8 dwell, "1A1 stopped between its ends";
    //   step 3 0.8–1.0 out mid (0.5) → 1, "1S2 actuated" (its 'open' position is not the rest position 'exhausting').
    const withRoller = new TestCircuit().add('a', 'cylinder-double-acting', { stroke: 0.1 }, '1A1').add('roller', 'valve-3-2-nc', { actuation: 'roller' }, '1S2').build();
    const restart = observedSequence(
      withRoller,
      handTrace(1.2, { a: ramp([0.2, 0], [0.6, 0.05], [0.8, 0.05], [1.0, 0.1]) }, [
        { t: 0.2, componentId: 'a', kind: 'started', detail: 'extending' },
        { t: 0.6, componentId: 'a', kind: 'stopped', detail: 'at 50.0 mm' },
        { t: 0.7, componentId: 'roller', kind: 'switched', detail: 'open' },
        { t: 0.8, componentId: 'a', kind: 'started', detail: 'extending' },
        { t: 1.0, componentId: 'a', kind: 'end-position', detail: 'extended' },
      ]),
    );
    expect(restart.steps.map((s) => [s.index, s.trigger, s.motions.map((m) => `${m.direction} ${m.from}→${m.to}`)])).toEqual([
      [0, null, []],
      [1, null, ['out 0→mid']],
      [2, '1A1 stopped between its ends', []],
      [3, '1S2 actuated', ['out mid→1']],
    ]);
    expect(restart.steps[3]!.motions[0]!.fromLevel).toBeCloseTo(0.5, 9);
  });

  it('is the initial situation alone when nothing moves', () => {
    const still = observedSequence(twoCylinders, handTrace(1.0, { a: () => 0, b: () => 0 }, [{ t: 0.2, componentId: 's1', kind: 'input-press' }]));
    expect(still.steps).toEqual([{ index: 0, startS: 0, endS: 1.0, motions: [], trigger: null, cause: null }]);
  });
});

describe('observedSequence on simulated demo circuits', () => {
  const run = (name: string, untilS: number) => {
    const document = demoDocument(name);
    const inputs = demoInputs(name);
    const trace = simulate(compile(document).model!, inputs, { untilS, intervalS: 0.01 });
    return { trace, sequence: observedSequence(document, trace) };
  };
  const eventTime = (trace: Trace, componentId: string, kind: string, detail?: string) =>
    trace.events.find((e) => e.componentId === componentId && e.kind === kind && (detail === undefined || e.detail === detail))!.t;

  it('carton clamp: out on 1S1, rests extended, back when 1S1 is released', () => {
    // The clamp goes out while 1S1 pilots 14, the roller 1S2 at the end pilots 12, and the
    // clamp comes back once 1S1 lets go of 14 (inputs: press 0.2 s, release 0.4 s).
    const { trace, sequence } = run('carton-clamp-sequence', 1.5);
    expect(sequence.actuators.map((a) => a.tag)).toEqual(['1A1']);
    expect(sequence.steps.map((s) => s.motions.map((m) => `${m.tag} ${m.direction} ${m.from}→${m.to}`))).toEqual([[], ['1A1 out 0→1'], [], ['1A1 in 1→0']]);
    expect(sequence.steps.map((s) => s.trigger)).toEqual([null, '1S1 pressed', '1A1 reached its end (extended)', '1S1 released']);
    expect(sequence.steps[1]!.startS).toBe(eventTime(trace, 'clamp', 'started', 'extending'));
    expect(sequence.steps[3]!.endS).toBe(eventTime(trace, 'clamp', 'end-position', 'retracted'));
  });

  it('lid press with relay control: out on S1, dwell until KT1 has timed, back', () => {
    const { trace, sequence } = run('lid-press-relay-control', 6);
    expect(sequence.steps.map((s) => s.motions.map((m) => `${m.tag} ${m.direction} ${m.from}→${m.to}`))).toEqual([[], ['1A1 out 0→1'], [], ['1A1 in 1→0']]);
    expect(sequence.steps.map((s) => s.trigger)).toEqual([null, 'S1 pressed', '1A1 reached its end (extended)', 'KT1 time elapsed']);
    // The dwell lasts from the press's arrival to the return: KT1's 0.5 s counted from 1B2 on, plus the switching delays.
    const dwell = sequence.steps[2]!;
    expect(dwell.startS).toBe(eventTime(trace, 'press', 'end-position', 'extended'));
    expect(dwell.endS).toBe(eventTime(trace, 'press', 'started', 'retracting'));
    expect(dwell.endS - eventTime(trace, 'down', 'actuated')).toBeGreaterThan(0.5);
  });
});
