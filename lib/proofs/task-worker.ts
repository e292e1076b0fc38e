// One engine thread of the proof task pool (./task-pool.ts): runs the paths it is sent with the
// rules compiled once per drawing and rules text.
import type { CircuitDocument } from '@/engine/document/schema';
import { checkRules, compileRulesText, type BoundRule } from '@/engine/proof/rules';
import { runProofTask, type ProofTask, type ProofTaskResult } from '@/engine/proof/search';
import { serveTasks } from '@/lib/jobs/thread-tasks';

/** What every path of one proof shares. */
export interface ProofContext {
  document: CircuitDocument;
  rulesText: string;
}

serveTasks<ProofContext, { document: CircuitDocument; rules: BoundRule[] }, ProofTask, ProofTaskResult>({
  prepare({ document, rulesText }) {
    const { rules, errors } = compileRulesText(rulesText, document);
    if (errors.length) throw new Error(`the rules do not compile: line ${errors[0]!.line}, column ${errors[0]!.column}: ${errors[0]!.message}`);
    return { document, rules };
  },
  run: ({ document, rules }, task) => runProofTask(document, task, (trace) => checkRules(rules, trace)),
});
