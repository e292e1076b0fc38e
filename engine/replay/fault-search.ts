import type { CircuitDocument } from '../document/schema';
import { applyFaults, FAULT_TYPES, faultsFor } from '../faults';
import type { FaultCandidate, FaultSpec } from '../faults/types';
import { compareRun, type CompareOptions } from './compare';
import { replayLog, type ReplayOptions } from './replay-log';
import type { RecordedLog } from './types';

/** One simulation of the search, plain and serialisable so that a worker thread can run it. */
export interface FaultTask {
  document: CircuitDocument;
  log: RecordedLog;
  /** Empty: the healthy drawing. */
  faults: FaultSpec[];
  compare?: CompareOptions;
  replay?: ReplayOptions;
}

export interface FaultTaskResult {
  /** Infinity when the faulted drawing could not be simulated. */
  score: number;
  match: number;
  error?: string;
}

export interface FaultSearchProgress {
  done: number;
  total: number;
  best?: { faultId: string; tag: string; severity: number; score: number; match: number };
}

export interface FaultSearchOptions {
  /** The candidates to try (default: every fault that applies to a part of the drawing). */
  faults?: FaultCandidate[];
  /** Severities tried across each range, ends included (default 5). */
  coarsePoints?: number;
  /** Halvings of the step around the best severity, two simulations each (default 6). */
  refineSteps?: number;
  /** Tasks handed to runBatch at a time (default 16): shouldStop is asked between batches. */
  batchSize?: number;
  compare?: CompareOptions;
  replay?: ReplayOptions;
  onProgress?(p: FaultSearchProgress): void;
  shouldStop?(): boolean;
  /** Runs tasks and returns their results in order; the default runs them in this thread. */
  runBatch?(tasks: FaultTask[]): Promise<FaultTaskResult[]>;
}

export interface FaultSearchCandidate {
  faultId: string;
  tag: string;
  label: string;
  /** Fitted severity, in severityUnit (SI). */
  severity: number;
  severityUnit: string;
  score: number;
  match: number;
  /** Baseline score − score: how much better the fault explains the log than the healthy drawing. */
  improvement: number;
  explanation: string;
}

export interface FaultSearchResult {
  baseline: { score: number; match: number };
  /** Best first. */
  candidates: FaultSearchCandidate[];
  /** Simulations run, the baseline included. */
  evaluated: number;
  /** False when stopped before every candidate was fitted. */
  complete: boolean;
}

/** Simulates one task and scores it against its log. Pure: a worker thread can call it. */
export function evaluateFaultTask(task: FaultTask): FaultTaskResult {
  try {
    const document = task.faults.length === 0 ? task.document : applyFaults(task.document, task.faults);
    const { trace } = replayLog(document, task.log, task.replay);
    const { score, match } = compareRun(document, task.log, trace, task.compare);
    return { score, match };
  } catch (e) {
    // The healthy run comes first, so a log that cannot be read fails there; a faulted drawing that cannot run is only a bad candidate.
    if (task.faults.length === 0) throw e;
    return { score: Infinity, match: 0, error: e instanceof Error ? e.message : String(e) };
  }
}

interface Fit {
  candidate: FaultCandidate;
  onOff: boolean;
  /** Current step of the refinement, in severity units. */
  step: number;
  severity: number;
  score: number;
  match: number;
  /** Severities already simulated, so that a refinement never repeats one. */
  tried: Set<number>;
}

/**
 * Which single fault explains the log best: every candidate's severity range is tried on a
 * coarse grid, then refined by halving the step around the best point (a pattern search: robust
 * to the small plateaus that 10 ms trace samples put in the score). On-off faults get one run.
 * Ranked by score, best first.
 */
export async function faultSearch(document: CircuitDocument, log: RecordedLog, options: FaultSearchOptions = {}): Promise<FaultSearchResult> {
  const coarse = Math.max(2, Math.round(options.coarsePoints ?? 5));
  const refineSteps = Math.max(0, Math.round(options.refineSteps ?? 6));
  const batchSize = Math.max(1, Math.round(options.batchSize ?? 16));
  const runBatch = options.runBatch ?? (async (tasks: FaultTask[]) => tasks.map(evaluateFaultTask));
  const candidates = options.faults ?? faultsFor(document);
  const onOffIds = new Set(FAULT_TYPES.filter((f) => f.onOff).map((f) => f.id));
  const task = (faults: FaultSpec[]): FaultTask => ({ document, log, faults, compare: options.compare, replay: options.replay });

  const [baseline] = await runBatch([task([])]);
  if (!baseline) throw new Error('runBatch returned no result for the healthy run');
  const total = 1 + candidates.reduce((n, c) => n + (isOnOff(c, onOffIds) ? 1 : coarse + 2 * refineSteps), 0);
  let done = 1;
  let evaluated = 1;
  const fits: Fit[] = candidates.map((candidate) => ({
    candidate,
    onOff: isOnOff(candidate, onOffIds),
    step: (candidate.severity.max - candidate.severity.min) / (coarse - 1),
    severity: candidate.severity.healthy,
    score: Infinity,
    match: 0,
    tried: new Set<number>(),
  }));
  const best = () => fits.reduce<Fit | null>((b, f) => (f.score < (b?.score ?? Infinity) ? f : b), null);
  const progress = () => {
    const b = best();
    options.onProgress?.({ done, total, best: b ? { faultId: b.candidate.faultId, tag: b.candidate.tag, severity: b.severity, score: b.score, match: b.match } : undefined });
  };
  progress();

  /** Runs the given severities in batches; false when stopped. */
  const run = async (jobs: Array<{ fit: Fit; severity: number }>): Promise<boolean> => {
    for (let at = 0; at < jobs.length; at += batchSize) {
      if (options.shouldStop?.()) return false;
      const chunk = jobs.slice(at, at + batchSize);
      const results = await runBatch(chunk.map(({ fit, severity }) => task([{ faultId: fit.candidate.faultId, tag: fit.candidate.tag, severity }])));
      chunk.forEach(({ fit, severity }, i) => {
        const r = results[i]!;
        fit.tried.add(severity);
        if (r.score < fit.score) Object.assign(fit, { severity, score: r.score, match: r.match });
      });
      done += chunk.length;
      evaluated += chunk.length;
      progress();
    }
    return true;
  };

  let complete = await run(
    fits.flatMap((fit) => {
      const { min, max } = fit.candidate.severity;
      if (fit.onOff) return [{ fit, severity: max }];
      return Array.from({ length: coarse }, (_, i) => ({ fit, severity: i === coarse - 1 ? max : min + i * fit.step }));
    }),
  );
  for (let s = 0; s < refineSteps && complete; s += 1) {
    const jobs = fits.flatMap((fit) => {
      if (fit.onOff || !Number.isFinite(fit.score)) return [];
      fit.step /= 2;
      const { min, max } = fit.candidate.severity;
      return [fit.severity - fit.step, fit.severity + fit.step]
        .map((severity) => Math.min(max, Math.max(min, severity)))
        .filter((severity, i, all) => !fit.tried.has(severity) && all.indexOf(severity) === i)
        .map((severity) => ({ fit, severity }));
    });
    // Points clipped at a range end or already tried are not run; count them as done so the bar reaches its end.
    const skipped = fits.filter((f) => !f.onOff).length * 2 - jobs.length;
    complete = await run(jobs);
    if (complete) done += skipped;
  }
  if (complete) {
    done = total;
    progress();
  }

  const ranked = fits.filter((f) => Number.isFinite(f.score)).sort((a, b) => a.score - b.score);
  const typeById = new Map(FAULT_TYPES.map((f) => [f.id, f]));
  const pct = (m: number) => `${Math.round(m)} %`;
  return {
    baseline: { score: baseline.score, match: baseline.match },
    candidates: ranked.map((fit, rank) => {
      const { candidate } = fit;
      const described = typeById.get(candidate.faultId)?.describe(candidate.tag, fit.severity) ?? `${candidate.label} on ${candidate.tag}.`;
      const improvement = baseline.score - fit.score;
      const verdict =
        improvement <= 0
          ? `It explains the log no better than the healthy model: match ${pct(fit.match)} (healthy model: ${pct(baseline.match)}).`
          : `${rank === 0 ? 'This explains the log best' : 'This explains the log'}: match ${pct(fit.match)} (healthy model: ${pct(baseline.match)}).`;
      return {
        faultId: candidate.faultId,
        tag: candidate.tag,
        label: candidate.label,
        severity: fit.severity,
        severityUnit: candidate.severity.unit,
        score: fit.score,
        match: fit.match,
        improvement,
        explanation: `${described} ${verdict}`,
      };
    }),
    evaluated,
    complete,
  };
}

function isOnOff(candidate: FaultCandidate, onOffIds: ReadonlySet<string>): boolean {
  return onOffIds.has(candidate.faultId) || candidate.severity.min === candidate.severity.max;
}
