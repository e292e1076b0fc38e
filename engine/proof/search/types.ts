import type { CircuitDocument } from '../../document/schema';
import type { InputEvent } from '../../solver/simulate';
import type { Trace } from '../../trace/trace';

/**
 * What the search may vary. A button is worked by hand (pressed and released, struck and reset,
 * or switched over) as often as the search likes; a sensor failure, a loss of supply air and a
 * loss of control power happen at most once and then stay.
 */
export type VariationKind = 'button' | 'sensor-stuck-on' | 'sensor-stuck-off' | 'supply-loss' | 'power-loss';

export const VARIATION_KINDS: readonly VariationKind[] = ['button', 'sensor-stuck-on', 'sensor-stuck-off', 'supply-loss', 'power-loss'];

/** One thing to vary: the component's tag and what happens to it. */
export interface Variation {
  tag: string;
  kind: VariationKind;
}

export interface SearchSpec {
  document: CircuitDocument;
  variations: Variation[];
  /** Time between the instants at which the variations may change, s. */
  quantumS: number;
  /** Number of quanta (levels) to search. */
  steps: number;
  /** Machine time run on after the last quantum of a path, so late consequences show, s (e.g. 1). */
  settleS: number;
  /** How far back in time the rules look, s (`longestWindowS` of the rules; 0 when none look back). */
  historyS: number;
}

/** The verdict of each rule on one trace. */
export interface SearchCheck {
  (trace: Trace): Array<{ name: string; holds: boolean; violatedAtS: number | null; explanation: string }>;
}

/** One path to simulate: timed inputs from t = 0, and how long to run. */
export interface ProofTask {
  inputs: InputEvent[];
  untilS: number;
  /** Machine time whose state the signature describes, s (default `untilS`); the run goes on to `untilS` for the checks. */
  signAtS?: number;
}

export interface ProofTaskResult {
  /** The physical state at `signAtS`, rounded (see ./signature.ts). */
  signature: string;
  verdicts: ReturnType<SearchCheck>;
}

export interface SearchProgress {
  level: number;
  levels: number;
  /** Paths simulated so far. */
  done: number;
  /** Paths the search expects to simulate in all (an estimate that improves as it goes). */
  total: number;
  states: number;
  elapsedS: number;
}

export interface Counterexample {
  inputs: InputEvent[];
  untilS: number;
  violatedAtS: number;
  explanation: string;
  /** Number of quanta of the path. */
  level: number;
}

export interface RuleOutcome {
  name: string;
  status: 'passed' | 'failed';
  /** Paths checked against this rule (up to and including its counterexample). */
  sequences: number;
  /** Distinct states known when the rule failed, or at the end. */
  states: number;
  counterexample: null | Counterexample;
}

export interface SearchResult {
  /** False when the search was stopped before it ran out of levels or states. */
  complete: boolean;
  /** Paths simulated. */
  sequences: number;
  /** Distinct states (signatures) met. */
  states: number;
  /** Levels searched. */
  levels: number;
  quantumS: number;
  rules: RuleOutcome[];
  elapsedS: number;
}

export interface SearchOptions {
  /** Runs a batch of paths and returns their results in order; the default runs them in this thread. */
  runBatch?: (tasks: ProofTask[]) => Promise<ProofTaskResult[]>;
  onProgress?: (p: SearchProgress) => void;
  /** Asked between batches; true stops the search (the result then says complete: false). */
  shouldStop?: () => boolean;
}
