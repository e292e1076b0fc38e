import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { circuitDocumentSchema, emptyDocument } from '@/engine/document/schema';
import { compile } from '@/engine/solver/compile';
import { simulate, type InputEvent } from '@/engine/solver/simulate';
import type { Trace } from '@/engine/trace/trace';
import { LIVE_RUN_HORIZON_S } from '@/lib/runs/live-run';
import { simulateSavedRun } from '@/lib/runs/simulate-saved-run';

const document = circuitDocumentSchema.parse(JSON.parse(readFileSync('demo/circuits/lid-press-two-hand.json', 'utf8')));
const inputs = JSON.parse(readFileSync('demo/circuits/lid-press-two-hand.inputs.json', 'utf8')) as InputEvent[];

/** The rows and events of a whole run, up to `untilS`. */
function upTo(trace: Trace, untilS: number) {
  const rows = trace.time.filter((t) => t <= untilS + 1e-9).length;
  return { time: trace.time.slice(0, rows), signals: trace.signals.map((s) => ({ ...s, values: s.values.slice(0, rows) })), events: trace.events.filter((e) => e.t <= untilS) };
}

function rowsOf(trace: Trace) {
  return { time: trace.time, signals: trace.signals, events: trace.events };
}

describe('simulateSavedRun', () => {
  it('gives the rows of the live run, which runs towards the ten-minute horizon', () => {
    const untilS = 1;
    const { trace } = simulateSavedRun({ document, inputs, untilS });
    const live = simulate(compile(document).model!, inputs, { untilS: LIVE_RUN_HORIZON_S, intervalS: 0.01 });
    expect(rowsOf(trace)).toEqual(upTo(live, untilS));
    expect(trace.time).toHaveLength(101);
    expect(trace.time.at(-1)).toBeCloseTo(1, 12);
    // A run that stops at untilS cuts its last steps short and so differs near the end.
    const stopped = simulate(compile(document).model!, inputs, { untilS, intervalS: 0.01 });
    expect(rowsOf(stopped)).not.toEqual(rowsOf(trace));
  });

  it('summarises the run: length, signals, steps, where the cylinder ended, events', () => {
    const { trace, summary } = simulateSavedRun({ document, inputs, untilS: 2 });
    expect(summary).toMatchObject({ untilS: 2, intervalS: 0.01, signalCount: 42, rowCount: 201, eventCount: trace.events.length });
    expect(summary.steps).toBeGreaterThan(0);
    expect(summary.rejectedSteps).toBeGreaterThanOrEqual(0);
    expect(Object.keys(summary.endPositionsM)).toEqual(['press']);
    expect(summary.endPositionsM.press).toBe(trace.signals.find((s) => s.name === 'press:x')!.values[200]);
    // Both buttons were pressed by 0.35 s: the press has gone out.
    expect(summary.endPositionsM.press).toBeGreaterThan(0.05);
  });

  it('refuses a drawing with errors, naming the revision number', () => {
    const broken = { ...emptyDocument(), components: [{ id: 'x', type: 'no-such-type', tag: 'Q1', parameters: {}, position: { x: 0, y: 0 }, rotation: 0 as const, mirrored: false }] };
    expect(() => simulateSavedRun({ document: broken, inputs: [], untilS: 1 })).toThrow(
      expect.objectContaining({ code: 'invalid:revisionNumber', field: 'revisionNumber', message: 'This revision\'s drawing has errors, so it cannot run: Q1: unknown component type "no-such-type"' }),
    );
  });

  it('refuses a trace too big to keep, saying how long this drawing may run', () => {
    // Forty unconnected cylinders: warnings only, but many signals.
    const crowded = circuitDocumentSchema.parse({
      schemaVersion: 1,
      components: Array.from({ length: 40 }, (_, i) => ({ id: `c${i}`, type: 'cylinder-double-acting', tag: `${i + 1}A1`, position: { x: i * 100, y: 0 } })),
    });
    expect(() => simulateSavedRun({ document: crowded, inputs: [], untilS: 600 })).toThrow(
      expect.objectContaining({ code: 'invalid:untilS', field: 'untilS', message: 'A saved run of this drawing (240 signals) can be at most 416 s long' }),
    );
    expect(simulateSavedRun({ document: crowded, inputs: [], untilS: 1 }).summary.signalCount).toBe(240);
  });
});
