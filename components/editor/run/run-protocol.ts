import type { CircuitDocument } from '@/engine/document/schema';
import type { Diagnostic } from '@/engine/solver/model';
import type { InputEvent } from '@/engine/solver/simulate';
import type { TraceEvent } from '@/engine/trace/trace';
import type { FlowColumns } from './flow-columns';

/** What the page asks of the run worker. One run at a time; messages of an older run are ignored. */
export type RunRequest =
  /** Compiles the drawing and stands at t = 0. */
  | { kind: 'start'; runId: number; document: CircuitDocument; untilS: number; intervalS: number }
  /** Simulates on until this machine time (the playback time plus a little lead). */
  | { kind: 'advance'; runId: number; toS: number }
  /** A hand on the drawing: applied at its time, or the earliest time the run can still change. */
  | { kind: 'input'; runId: number; input: InputEvent }
  | { kind: 'stop'; runId: number };

/** What the worker sends back: the signal names once, then rows as they settle. */
export type RunReply =
  | {
      kind: 'started';
      runId: number;
      names: string[];
      intervalS: number;
      /** Which flow columns sum to the air through each port and along each tube. */
      flows: FlowColumns;
    }
  | {
      kind: 'rows';
      runId: number;
      /** Index of the first row in the run. */
      first: number;
      time: Float64Array;
      /** Row after row, `names.length` values each. */
      values: Float64Array;
      events: TraceEvent[];
      /** The run has reached its end. */
      finished: boolean;
      /** Wall time the engine spent on these rows, ms. */
      computeMs: number;
    }
  | { kind: 'input-applied'; runId: number; input: InputEvent }
  | { kind: 'failed'; runId: number; message: string; diagnostics: Diagnostic[] };
