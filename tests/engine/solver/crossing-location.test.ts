import { describe, expect, it } from 'vitest';
import { compile } from '@/engine/solver/compile';
import { simulate } from '@/engine/solver/simulate';
import type { TraceEvent } from '@/engine/trace/trace';
import { generatedCircuit, generatedElectroCircuit } from '@/scripts/bench/generated-circuits';

function eventsOf(generate: typeof generatedCircuit, size: number): TraceEvent[] {
  const { document, inputs } = generate(size);
  const { model, diagnostics } = compile(document);
  if (!model) throw new Error(diagnostics.map((d) => d.message).join('\n'));
  return simulate(model, inputs, { untilS: 10, intervalS: 0.01 }).events;
}

// A guard crossing inside a step is located on the step's interpolant. Every cylinder of these
// circuits strokes out and back once every two seconds, so each start of a stroke is followed
// by exactly one end position, in the direction of travel; a piston resting on its stop that
// the interpolation moved by one bit would report reaching that stop again as it leaves.
describe('crossings located on the step interpolant', () => {
  for (const [name, generate] of [
    ['pneumatic', generatedCircuit],
    ['electro-pneumatic', generatedElectroCircuit],
  ] as const) {
    it(`give one end position per stroke, in the direction of travel, in the ${name} cells`, () => {
      const events = eventsOf(generate, 50);
      const cylinders = [...new Set(events.filter((e) => e.kind === 'end-position').map((e) => e.componentId))];
      expect(cylinders.length).toBeGreaterThanOrEqual(6);
      for (const id of cylinders) {
        const strokes = events.filter((e) => e.componentId === id && (e.kind === 'started' || e.kind === 'end-position')).map((e) => `${e.kind} ${e.detail}`);
        const expected = strokes.map((_, i) => (i % 4 === 0 ? 'started extending' : i % 4 === 1 ? 'end-position extended' : i % 4 === 2 ? 'started retracting' : 'end-position retracted'));
        expect({ id, strokes }).toEqual({ id, strokes: expected });
        expect(strokes.length).toBeGreaterThanOrEqual(16);
      }
    });
  }
});
