import type { InputEvent } from '../../solver/simulate';
import { runProofTask } from './run-task';
import type { ProofTask, ProofTaskResult, RuleOutcome, SearchCheck, SearchOptions, SearchProgress, SearchResult, SearchSpec } from './types';
import { bindVariations, type BoundVariation } from './variations';

/**
 * Paths handed to `runBatch` at a time. Fixed, so that where a search stops (every rule failed)
 * does not depend on how many threads run it; large enough to keep a pool of threads busy.
 */
export const BATCH_TASKS = 32;

/** A path kept at a level: its timed inputs and where each variation stands after them. */
interface Path {
  inputs: InputEvent[];
  /** Per variation: changed from the drawing's state (pressed, struck, failed, lost). */
  states: boolean[];
  /** Per variation: the level at whose start it last changed, -1 never. */
  changedAt: number[];
}

interface Child {
  path: Path;
  parent: number;
  /** Rank of the subset among the parent's children (fewest changes first). */
  rank: number;
}

/** Every subset of the given indices, fewest first, then in index order. */
function subsetsOf(indices: readonly number[]): number[][] {
  const all: number[][] = [];
  for (let mask = 0; mask < 1 << indices.length; mask += 1) all.push(indices.filter((_, i) => mask & (1 << i)));
  return all.sort((a, b) => a.length - b.length || compareLists(a, b));
}

function compareLists(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < a.length; i += 1) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return 0;
}

function childOf(parent: Path, subset: readonly number[], variations: readonly BoundVariation[], level: number, quantumS: number): Path {
  const inputs = [...parent.inputs];
  const states = [...parent.states];
  const changedAt = [...parent.changedAt];
  for (const v of subset) {
    const variation = variations[v]!;
    inputs.push({ t: level * quantumS, component: variation.tag, ...variation.command(states[v]!) });
    states[v] = !states[v];
    changedAt[v] = level;
  }
  return { inputs, states, changedAt };
}

/** The variations' part of a state: where each stands and how many quanta ago it last changed, capped. */
function variationSignature(path: Path, signedLevel: number, cap: number): string {
  return path.states.map((s, v) => `${s ? 1 : 0}${path.changedAt[v]! < 0 ? cap : Math.min(cap, signedLevel - path.changedAt[v]!)}`).join(',');
}

function checkSpec(spec: SearchSpec): void {
  const problems: string[] = [];
  if (!(spec.quantumS > 0) || !Number.isFinite(spec.quantumS)) problems.push('quantum must be a positive number of seconds');
  if (!Number.isInteger(spec.steps) || spec.steps < 1) problems.push('steps must be a whole number of at least 1');
  if (!(spec.settleS >= 0) || !Number.isFinite(spec.settleS)) problems.push('settle must be zero or a positive number of seconds');
  if (!(spec.historyS >= 0) || !Number.isFinite(spec.historyS)) problems.push('history must be zero or a positive number of seconds');
  if (spec.variations.length > 16) problems.push('at most 16 variations');
  if (problems.length) throw new Error(`cannot search: ${problems.join('; ')}`);
}

/**
 * Searches every combination and timing of the variations, level by level (breadth first): at
 * level L each kept path branches into every subset of the variations that can still change,
 * changing at L·quantum; each child is simulated from t = 0 to (L+1)·quantum + settle, its state
 * at (L+1)·quantum is signed, and a child whose signature was met before is checked but not
 * expanded. Children are run fewest input changes first, so the first path that breaks a rule is
 * a shortest counterexample: fewest quanta, then fewest input changes. See README.md.
 */
export async function runProofSearch(spec: SearchSpec, check: SearchCheck, options: SearchOptions = {}): Promise<SearchResult> {
  checkSpec(spec);
  const variations = bindVariations(spec.document, spec.variations);
  const runBatch = options.runBatch ?? (async (tasks: ProofTask[]) => tasks.map((task) => runProofTask(spec.document, task, check)));
  const q = spec.quantumS;
  const cap = Math.ceil(spec.historyS / q - 1e-9) + 1;
  const started = performance.now();
  const elapsed = () => (performance.now() - started) / 1000;
  const seen = new Set<string>();
  const outcomes = new Map<string, RuleOutcome>();
  let frontier: Path[] = [{ inputs: [], states: variations.map(() => false), changedAt: variations.map(() => -1) }];
  let sequences = 0;
  let levels = 0;
  let stopped = false;
  let allFailed = false;

  for (let level = 0; level < spec.steps && frontier.length && !stopped && !allFailed; level += 1) {
    levels = level + 1;
    const children: Child[] = [];
    frontier.forEach((parent, index) => {
      const open = variations.flatMap((v, i) => (v.once && parent.states[i] ? [] : [i]));
      subsetsOf(open).forEach((subset, rank) => children.push({ path: childOf(parent, subset, variations, level, q), parent: index, rank }));
    });
    children.sort((a, b) => a.path.inputs.length - b.path.inputs.length || a.parent - b.parent || a.rank - b.rank);
    const next: Path[] = [];
    const signAtS = (level + 1) * q;
    const untilS = signAtS + spec.settleS;
    for (let from = 0; from < children.length && !stopped && !allFailed; from += BATCH_TASKS) {
      const batch = children.slice(from, from + BATCH_TASKS);
      const tasks = batch.map((c): ProofTask => ({ inputs: c.path.inputs, untilS, signAtS }));
      const results: ProofTaskResult[] = await runBatch(tasks);
      results.forEach((result, i) => {
        const child = batch[i]!;
        sequences += 1;
        const signature = `${result.signature}|${variationSignature(child.path, level + 1, cap)}`;
        if (!seen.has(signature)) {
          seen.add(signature);
          next.push(child.path);
        }
        for (const verdict of result.verdicts) {
          let outcome = outcomes.get(verdict.name);
          if (!outcome) {
            outcome = { name: verdict.name, status: 'passed', sequences: 0, states: 0, counterexample: null };
            outcomes.set(verdict.name, outcome);
          }
          if (outcome.status === 'failed') continue;
          outcome.sequences += 1;
          outcome.states = seen.size;
          if (!verdict.holds) {
            outcome.status = 'failed';
            outcome.counterexample = { inputs: tasks[i]!.inputs, untilS, violatedAtS: verdict.violatedAtS ?? untilS, explanation: verdict.explanation, level: level + 1 };
          }
        }
      });
      allFailed = outcomes.size > 0 && [...outcomes.values()].every((o) => o.status === 'failed');
      options.onProgress?.(progress(level, spec.steps, sequences, children.length - from - batch.length, next.length, from + batch.length, children.length / frontier.length, seen.size, elapsed()));
      if (options.shouldStop?.()) stopped = true;
    }
    frontier = next;
  }
  for (const outcome of outcomes.values()) if (outcome.status === 'passed') outcome.states = seen.size;
  return { complete: !stopped, sequences, states: seen.size, levels, quantumS: q, rules: [...outcomes.values()], elapsedS: elapsed() };
}

/**
 * Progress with an estimate of the paths still to come: the rest of this level, then each later
 * level as the kept paths of the one before times the branching, at the share of new states
 * seen so far in this level.
 */
function progress(level: number, levels: number, done: number, leftInLevel: number, kept: number, runInLevel: number, branching: number, states: number, elapsedS: number): SearchProgress {
  const keptShare = runInLevel ? kept / runInLevel : 1;
  let paths = (kept + leftInLevel * keptShare) * branching;
  let total = done + leftInLevel;
  for (let l = level + 1; l < levels && total < Number.MAX_SAFE_INTEGER; l += 1) {
    total += paths;
    paths *= keptShare * branching;
  }
  return { level: level + 1, levels, done, total: Math.min(Math.round(total), Number.MAX_SAFE_INTEGER), states, elapsedS };
}
