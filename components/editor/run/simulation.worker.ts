/// <reference lib="webworker" />
import { compile } from '@/engine/solver/compile';
import { simulate } from '@/engine/solver/simulate';
import type { SimulateReply, SimulateRequest } from './run-protocol';

// The engine runs here, off the page's thread, so the drawing stays responsive while it works.
declare const self: DedicatedWorkerGlobalScope;

self.onmessage = (event: MessageEvent<SimulateRequest>) => {
  const request = event.data;
  const started = performance.now();
  const { model, diagnostics } = compile(request.document);
  if (!model) {
    const reply: SimulateReply = { kind: 'failed', requestId: request.requestId, message: 'The drawing has errors; see Checks.', diagnostics };
    self.postMessage(reply);
    return;
  }
  try {
    const trace = simulate(model, request.inputs, { untilS: request.untilS, intervalS: request.intervalS });
    const columns = trace.signals.map((s) => Float64Array.from(s.values));
    const time = Float64Array.from(trace.time);
    const reply: SimulateReply = {
      kind: 'trace',
      requestId: request.requestId,
      intervalS: trace.intervalS,
      time,
      names: trace.signals.map((s) => s.name),
      columns,
      events: trace.events,
      computeMs: performance.now() - started,
    };
    self.postMessage(reply, [time.buffer, ...columns.map((c) => c.buffer)]);
  } catch (error) {
    const reply: SimulateReply = { kind: 'failed', requestId: request.requestId, message: error instanceof Error ? error.message : String(error), diagnostics };
    self.postMessage(reply);
  }
};
