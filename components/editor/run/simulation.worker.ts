/// <reference lib="webworker" />
import { compile } from '@/engine/solver/compile';
import { startSimulation, type SteppedSimulation } from '@/engine/solver/simulate';
import type { SignalUnit, TraceEvent, TraceSink } from '@/engine/trace/trace';
import type { RunReply, RunRequest } from './run-protocol';
import { flowColumns } from './flow-columns';

// The engine runs here, off the page's thread, so the drawing stays responsive while it works.
declare const self: DedicatedWorkerGlobalScope;

/** Machine time simulated between looks at the mailbox: keeps inputs and stops prompt when running far ahead. */
const PIECE_S = 0.25;

/** Collects the rows and events that settle during one piece of work, to send them in one message. */
class Outbox implements TraceSink {
  names: string[] = [];
  sent = 0;
  private time: number[] = [];
  private values: number[] = [];
  private events: TraceEvent[] = [];

  begin(signals: ReadonlyArray<{ name: string; unit: SignalUnit }>): void {
    this.names = signals.map((s) => s.name);
  }

  sample(t: number, values: Float64Array): void {
    this.time.push(t);
    for (let i = 0; i < values.length; i += 1) this.values.push(values[i]!);
  }

  event(event: TraceEvent): void {
    this.events.push(event);
  }

  send(runId: number, finished: boolean, computeMs: number): void {
    if (this.time.length === 0 && this.events.length === 0 && !finished) return;
    const time = Float64Array.from(this.time);
    const values = Float64Array.from(this.values);
    const reply: RunReply = { kind: 'rows', runId, first: this.sent, time, values, events: this.events, finished, computeMs };
    self.postMessage(reply, [time.buffer, values.buffer]);
    this.sent += this.time.length;
    this.time = [];
    this.values = [];
    this.events = [];
  }
}

let current: { runId: number; simulation: SteppedSimulation; outbox: Outbox; target: number } | null = null;

/** The rows the page asked for have not all been sent yet. */
const behind = (run: NonNullable<typeof current>) => !run.simulation.finished && run.simulation.sentUpTo < run.target;

/** Works towards the target a piece at a time, sending what settled after each piece. */
function pump(): void {
  const run = current;
  if (!run || !behind(run)) return;
  const started = performance.now();
  try {
    run.simulation.advanceUntilSent(Math.min(run.target, run.simulation.sentUpTo + PIECE_S));
  } catch (error) {
    const reply: RunReply = { kind: 'failed', runId: run.runId, message: error instanceof Error ? error.message : String(error), diagnostics: [] };
    self.postMessage(reply);
    current = null;
    return;
  }
  run.outbox.send(run.runId, run.simulation.finished, performance.now() - started);
  // Let waiting messages (an input, a new target, a stop) in before the next piece.
  if (behind(run)) setTimeout(pump, 0);
}

self.onmessage = (event: MessageEvent<RunRequest>) => {
  const request = event.data;
  if (request.kind === 'start') {
    const { model, diagnostics } = compile(request.document);
    if (!model) {
      const reply: RunReply = { kind: 'failed', runId: request.runId, message: 'The drawing has errors; see Checks.', diagnostics };
      self.postMessage(reply);
      current = null;
      return;
    }
    const outbox = new Outbox();
    const simulation = startSimulation(model, { untilS: request.untilS, intervalS: request.intervalS }, outbox);
    current = { runId: request.runId, simulation, outbox, target: 0 };
    const flows = flowColumns(request.document, model, outbox.names);
    const reply: RunReply = { kind: 'started', runId: request.runId, names: outbox.names, intervalS: simulation.intervalS, flows };
    self.postMessage(reply);
    return;
  }
  if (!current || current.runId !== request.runId) return;
  if (request.kind === 'stop') current = null;
  else if (request.kind === 'advance') {
    current.target = Math.max(current.target, request.toS);
    pump();
  } else {
    const input = current.simulation.addInput(request.input);
    const reply: RunReply = { kind: 'input-applied', runId: current.runId, input };
    self.postMessage(reply);
    pump();
  }
};
