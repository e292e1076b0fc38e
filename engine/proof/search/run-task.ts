import type { CircuitDocument } from '../../document/schema';
import { compile } from '../../solver/compile';
import { simulate } from '../../solver/simulate';
import { signState } from './signature';
import type { ProofTask, ProofTaskResult, SearchCheck } from './types';

/** Output interval of the runs of a proof, s: rules and signatures read rows this far apart. */
export const PROOF_INTERVAL_S = 0.01;

/**
 * Runs one path: compiles the document (a compiled model keeps its components' state in
 * closures and runs once, so every path is compiled and simulated afresh from t = 0), simulates
 * it to `untilS`, signs the state at `signAtS` and checks the whole trace. Pure: the same
 * arguments give the same result.
 */
export function runProofTask(document: CircuitDocument, task: ProofTask, check: SearchCheck): ProofTaskResult {
  const { model, diagnostics } = compile(document);
  if (!model) throw new Error(`the circuit does not compile: ${diagnostics.filter((d) => d.severity === 'error').map((d) => `${d.code}: ${d.message}`).join('; ')}`);
  // Passage flows are left out of the trace: neither the rules nor the signature read them, and they are most of its columns.
  const trace = simulate(model, task.inputs, { untilS: task.untilS, intervalS: PROOF_INTERVAL_S, recordFlows: false });
  return { signature: signState(trace, task.signAtS ?? task.untilS), verdicts: check(trace) };
}
