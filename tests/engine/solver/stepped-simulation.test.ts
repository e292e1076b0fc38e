import { describe, expect, it } from 'vitest';
import { compile } from '@/engine/solver/compile';
import { simulate, startSimulation, type InputEvent } from '@/engine/solver/simulate';
import { MemoryTraceSink, type Trace } from '@/engine/trace/trace';
import { demoDocument, demoInputs } from '@/tests/support/demo-circuits';

function demo(name: string) {
  return { document: demoDocument(name), inputs: demoInputs(name) };
}

const OPTIONS = { untilS: 6, intervalS: 0.01 };

function wholeRun(name: string, inputs: readonly InputEvent[]): Trace {
  return simulate(compile(demo(name).document).model!, inputs, OPTIONS);
}

/** Rows and events of a trace, for comparing two runs exactly. */
function rows(trace: Trace) {
  return { time: trace.time, signals: trace.signals.map((s) => [s.name, s.values] as const), events: trace.events };
}

describe('a run advanced piece by piece', () => {
  it.each(['lid-press-two-hand', 'lid-press-relay-control'])('gives %s the same rows as one whole run, bit for bit', (name) => {
    const { document, inputs } = demo(name);
    const sink = new MemoryTraceSink();
    const run = startSimulation(compile(document).model!, OPTIONS, sink, inputs);
    // Uneven pieces, some shorter than an output interval and some longer than a step.
    let t = 0;
    for (let i = 0; !run.finished; i += 1) {
      const before = t;
      t += [0.003, 0.017, 0.05, 0.31][i % 4]!;
      run.advance(t);
      // The rows go out as they settle: by the end of a piece, everything up to a step (0.02 s at
      // most) and a row before the previous piece's end (a part that has just come to rest keeps
      // its last step open until the next piece).
      if (!run.finished) expect(run.sentUpTo).toBeGreaterThanOrEqual(before - 0.02 - 0.01 - 1e-9);
    }
    expect(rows(sink.toTrace(OPTIONS.intervalS, { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 }))).toEqual(rows(wholeRun(name, inputs)));
  });

  it('takes inputs while it runs: a button pressed late acts exactly as if it had been known from the start', () => {
    const { document, inputs } = demo('lid-press-two-hand');
    const sink = new MemoryTraceSink();
    const run = startSimulation(compile(document).model!, OPTIONS, sink);
    const applied: InputEvent[] = [];
    const pending = [...inputs];
    for (let t = 0.05; !run.finished; t += 0.05) {
      // The page asks for the present playback time; the run applies it at the earliest time still open.
      while (pending.length && pending[0]!.t <= t) applied.push(run.addInput({ ...pending.shift()!, t: t - 0.05 }));
      run.advance(t);
    }
    expect(applied).toHaveLength(inputs.length);
    for (const input of applied) expect(input.t).toBeGreaterThanOrEqual(0);
    const live = sink.toTrace(OPTIONS.intervalS, { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 });
    const replay = wholeRun('lid-press-two-hand', applied);
    expect(rows(live)).toEqual(rows(replay));
    // The press worked: the lid press cylinder went out (so the comparison is of a run that did something).
    const piston = replay.signals.find((s) => s.name.endsWith(':x'))!;
    expect(Math.max(...piston.values)).toBeGreaterThan(0.05);
  });

  it('sends every row up to a time when asked to, and the rows are still those of one whole run', () => {
    const { document, inputs } = demo('lid-press-relay-control');
    const sink = new MemoryTraceSink();
    const run = startSimulation(compile(document).model!, OPTIONS, sink, inputs);
    for (const t of [0.37, 1.2, 2.05, 4.5]) {
      run.advanceUntilSent(t);
      expect(run.sentUpTo).toBeGreaterThanOrEqual(t - 1e-9);
      // Not far past it either: it goes on an output interval at a time.
      expect(sink.toTrace(OPTIONS.intervalS, { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 }).time.at(-1)).toBeLessThan(t + 0.05);
    }
    run.advanceUntilSent(OPTIONS.untilS);
    expect(run.finished).toBe(true);
    expect(rows(sink.toTrace(OPTIONS.intervalS, { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 }))).toEqual(rows(wholeRun('lid-press-relay-control', inputs)));
  });

  it('never applies an input before a row it has already sent', () => {
    const { document } = demo('lid-press-two-hand');
    const sink = new MemoryTraceSink();
    const run = startSimulation(compile(document).model!, OPTIONS, sink);
    run.advance(1);
    const open = run.earliestInputTime();
    expect(open).toBeGreaterThan(run.sentUpTo);
    expect(open).toBeGreaterThanOrEqual(0.98);
    const applied = run.addInput({ t: 0.2, component: '1S1', action: 'press' });
    expect(applied.t).toBe(open);
    expect(applied.component).toBe('1S1');
  });
});
