import type { CircuitDocument } from '@/engine/document/schema';
import type { Diagnostic } from '@/engine/solver/model';
import type { InputEvent } from '@/engine/solver/simulate';
import type { TraceEvent } from '@/engine/trace/trace';

/** Asks the run worker to simulate a drawing from t = 0 with the inputs given so far. */
export interface SimulateRequest {
  kind: 'simulate';
  requestId: number;
  document: CircuitDocument;
  inputs: readonly InputEvent[];
  untilS: number;
  intervalS: number;
}

/** The result: one column per signal (typed arrays travel to the page without copying). */
export type SimulateReply =
  | {
      kind: 'trace';
      requestId: number;
      intervalS: number;
      time: Float64Array;
      names: string[];
      columns: Float64Array[];
      events: TraceEvent[];
      computeMs: number;
    }
  | { kind: 'failed'; requestId: number; message: string; diagnostics: Diagnostic[] };
