/** The exhaustive timing search of interlock proofs. See README.md. */
export { runProofSearch, BATCH_TASKS } from './search';
export { runProofTask, PROOF_INTERVAL_S } from './run-task';
export { describeVariations } from './variations';
export * from './types';
