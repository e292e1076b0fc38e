/** Field-log replay: recorded commands drive the model, recorded sensors are compared with it, faults are fitted. See README.md. */
export type { RecordedLog, RecordedRole, RecordedSignal } from './types';
export { ReplayError } from './errors';
export { commandsToInputs } from './commands';
export { replayLog, REPLAY_INTERVAL_S, REPLAY_SETTLE_S, type ReplayOptions } from './replay-log';
export { atomSeries } from './observe';
export { compareRun, COMPARE_DEFAULTS, type Comparison, type CompareOptions, type Divergence, type Edge, type EdgePair, type SignalComparison } from './compare';
export {
  evaluateFaultTask,
  faultSearch,
  type FaultSearchCandidate,
  type FaultSearchOptions,
  type FaultSearchProgress,
  type FaultSearchResult,
  type FaultTask,
  type FaultTaskResult,
} from './fault-search';
export { mulberry32, recordTrace, type RecordOptions } from './record';
