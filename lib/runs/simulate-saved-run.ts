import type { CircuitDocument } from '@/engine/document/schema';
import { compile } from '@/engine/solver/compile';
import { startSimulation, type InputEvent } from '@/engine/solver/simulate';
import { MemoryTraceSink, type SignalUnit, type Trace, type TraceEvent, type TraceSink } from '@/engine/trace/trace';
import { AppError } from '@/lib/errors';
import { LIVE_RUN_HORIZON_S, LIVE_RUN_INTERVAL_S } from './live-run';

/** Most values (signals × rows) a saved trace may hold: about 200 MB of JSON, which is read back whole. */
const SAVED_RUN_MAX_VALUES = 10_000_000;

export interface RunSummary {
  untilS: number;
  intervalS: number;
  signalCount: number;
  rowCount: number;
  /** Steps the engine took (a little past `untilS`: it stops once every row up to there is settled), and how many it took again. */
  steps: number;
  rejectedSteps: number;
  /** Where each cylinder's piston ended, m from its retracted end, by component id. */
  endPositionsM: Record<string, number>;
  eventCount: number;
}

/** Keeps the rows and events up to the end of the saved stretch; the engine settles a little past it. */
class StretchSink implements TraceSink {
  readonly memory = new MemoryTraceSink();
  signalCount = 0;

  constructor(
    private readonly lastRow: number,
    private readonly untilS: number,
  ) {}

  begin(signals: ReadonlyArray<{ name: string; unit: SignalUnit }>): void {
    this.signalCount = signals.length;
    this.memory.begin(signals);
  }

  sample(t: number, values: Float64Array): void {
    if (Math.round(t / LIVE_RUN_INTERVAL_S) > this.lastRow) return;
    this.memory.sample(t, values);
  }

  event(event: TraceEvent): void {
    if (event.t <= this.untilS) this.memory.event(event);
  }
}

/**
 * Simulates a revision's drawing with the inputs of a live run, as the editor's engine ran it,
 * and returns the trace up to `untilS` with its summary. A drawing with errors is
 * `invalid:revisionNumber`; a trace too big to keep is `invalid:untilS`.
 */
export function simulateSavedRun({ document, inputs, untilS }: { document: CircuitDocument; inputs: readonly InputEvent[]; untilS: number }): { trace: Trace; summary: RunSummary } {
  const { model, diagnostics } = compile(document);
  if (!model) {
    const errors = diagnostics.filter((d) => d.severity === 'error');
    const more = errors.length > 1 ? ` (and ${errors.length - 1} more)` : '';
    throw new AppError('invalid', 'revisionNumber', `This revision's drawing has errors, so it cannot run: ${errors[0]?.message ?? 'see Checks'}${more}`, 'revisionNumber');
  }
  const lastRow = Math.floor(untilS / LIVE_RUN_INTERVAL_S + 1e-9);
  const sink = new StretchSink(lastRow, untilS);
  const run = startSimulation(model, { untilS: LIVE_RUN_HORIZON_S, intervalS: LIVE_RUN_INTERVAL_S }, sink, inputs);
  const rowsAllowed = Math.floor(SAVED_RUN_MAX_VALUES / Math.max(1, sink.signalCount));
  if (lastRow + 1 > rowsAllowed) {
    const longestS = Math.floor((rowsAllowed - 1) * LIVE_RUN_INTERVAL_S);
    throw new AppError('invalid', 'untilS', `A saved run of this drawing (${sink.signalCount} signals) can be at most ${longestS} s long`, 'untilS');
  }
  run.advanceUntilSent(untilS);
  const trace = sink.memory.toTrace(LIVE_RUN_INTERVAL_S, run.finish().stats);
  return { trace, summary: summarise(trace, untilS) };
}

function summarise(trace: Trace, untilS: number): RunSummary {
  const endPositionsM: Record<string, number> = {};
  for (const s of trace.signals) {
    if (s.unit === 'm' && s.name.endsWith(':x') && s.values.length) endPositionsM[s.name.slice(0, -':x'.length)] = s.values[s.values.length - 1]!;
  }
  return {
    untilS,
    intervalS: trace.intervalS,
    signalCount: trace.signals.length,
    rowCount: trace.time.length,
    steps: trace.stats.steps,
    rejectedSteps: trace.stats.rejectedSteps,
    endPositionsM,
    eventCount: trace.events.length,
  };
}
