// One engine thread of the fault-search pool (./fault-task-pool.ts): simulates faulted drawings
// against the log it was sent once per search.
import { evaluateFaultTask, type FaultTask, type FaultTaskResult } from '@/engine/replay';
import { serveTasks } from '@/lib/jobs/thread-tasks';

/** What every simulation of one search shares: the drawing, the log and the options. */
export type FaultContext = Omit<FaultTask, 'faults'>;

serveTasks<FaultContext, FaultContext, FaultTask['faults'], FaultTaskResult>({
  prepare: (context) => context,
  run: (context, faults) => evaluateFaultTask({ ...context, faults }),
});
