// Shared contract between the log parser (lib/field-logs), the server and the replay engine.
// Pure types: the engine never imports lib/, so the recorded log is defined here.

export type RecordedRole = 'command' | 'observation';

export interface RecordedSignal {
  /** A component tag of the circuit, e.g. '1S1', '1B2', '1A1', '1M1', '0Z1'. */
  tag: string;
  /** What is recorded, in the rule language's words ('pressed', 'on', 'extended', ...), 'pressure:<port>' or 'position'. */
  word: string;
  /** A command drives the simulation; an observation is compared with it. */
  role: RecordedRole;
  /** state: 0/1 values; number: SI values. */
  kind: 'state' | 'number';
  /** Seconds from the start of the log, ascending. */
  times: number[];
  /** 0/1 for state; SI for number (Pa absolute for pressure, m for position). */
  values: number[];
}

export interface RecordedLog {
  signals: RecordedSignal[];
  durationS: number;
}
