/** A saved run opened on the drawing: a scenario's, or a rule's counterexample. */
export interface ReplayTarget {
  runId: string;
  /** What the replay is of, e.g. "Counterexample: 1A1 two-hand start". */
  title: string;
  /** The rules checked on the run (a scenario's expectations, or the proof's rules); broken ones are marked at their moment. */
  rulesText: string;
  /** The rule the replay is about, when it opens for one; otherwise the first broken one. */
  focusRule?: string;
}
