/**
 * Small helpers shared by the solver reference tests: compile and run a document, read signals and
 * events back out of the trace. Nothing here models physics; the reference models live in each test.
 */
import { compile } from '@/engine/solver/compile';
import { simulate, type InputEvent, type SimulationOptions } from '@/engine/solver/simulate';
import { signal, type Trace } from '@/engine/trace/trace';
import type { CircuitDocument } from '@/engine/document/schema';

/** Compiles a document (failing loudly on an error diagnostic) and simulates it. */
export function run(document: CircuitDocument, inputs: InputEvent[], options: SimulationOptions): Trace {
  const { model, diagnostics } = compile(document);
  if (!model) throw new Error(`compile failed: ${diagnostics.map((d) => d.message).join('; ')}`);
  return simulate(model, inputs, options);
}

/** The values of a named signal; throws when the trace lacks it. */
export function values(trace: Trace, name: string): number[] {
  const s = signal(trace, name);
  if (!s) throw new Error(`trace has no signal ${name}; it has ${trace.signals.map((x) => x.name).join(', ')}`);
  return s.values;
}

/**
 * First time at which a sampled, rising signal reaches `level`, by linear interpolation between the two
 * samples that bracket it. Throws when the level is never reached.
 */
export function firstCrossing(time: readonly number[], y: readonly number[], level: number): number {
  for (let i = 1; i < y.length; i += 1) {
    const y0 = y[i - 1]!;
    const y1 = y[i]!;
    if (y0 < level && y1 >= level) return time[i - 1]! + ((level - y0) / (y1 - y0)) * (time[i]! - time[i - 1]!);
  }
  throw new Error(`signal never reaches ${level}`);
}

/** Time of the first event of a kind (and optionally detail) emitted by a component. */
export function eventTime(trace: Trace, componentId: string, kind: string, detail?: string, after = -Infinity): number {
  const e = trace.events.find((x) => x.componentId === componentId && x.kind === kind && (detail === undefined || x.detail === detail) && x.t > after);
  if (!e) throw new Error(`no ${kind}${detail ? ` (${detail})` : ''} event from ${componentId}`);
  return e.t;
}

/** Relative difference |a − b|/|b|. */
export function relDiff(a: number, b: number): number {
  return Math.abs(a - b) / Math.abs(b);
}
