import type { CircuitDocument } from '../document/schema';
import { compile } from '../solver/compile';
import { simulate, type InputEvent } from '../solver/simulate';
import type { Trace } from '../trace/trace';
import { commandsToInputs } from './commands';
import { ReplayError } from './errors';
import type { RecordedLog } from './types';

export interface ReplayOptions {
  /** Time simulated past the end of the log, s (default 0.5): a last command's effect shows. */
  settleS?: number;
  /** Output interval of the trace, s (default 0.01). */
  intervalS?: number;
}

export const REPLAY_INTERVAL_S = 0.01;
export const REPLAY_SETTLE_S = 0.5;

/** Simulates the drawing driven by the log's commands, from t = 0 to the end of the log plus the settle time. */
export function replayLog(document: CircuitDocument, log: RecordedLog, options: ReplayOptions = {}): { trace: Trace; inputs: InputEvent[] } {
  const inputs = commandsToInputs(log, document);
  const { model, diagnostics } = compile(document);
  if (!model) {
    const errors = diagnostics.filter((d) => d.severity === 'error').map((d) => d.message);
    throw new ReplayError(`the circuit does not compile: ${errors.join('; ')}`);
  }
  // Flows are left out: the comparison reads states, positions and pressures only.
  const trace = simulate(model, inputs, {
    untilS: log.durationS + (options.settleS ?? REPLAY_SETTLE_S),
    intervalS: options.intervalS ?? REPLAY_INTERVAL_S,
    recordFlows: false,
  });
  return { trace, inputs };
}
