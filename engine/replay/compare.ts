import type { CircuitDocument } from '../document/schema';
import type { Trace } from '../trace/trace';
import { STATE_THRESHOLD } from './commands';
import { ReplayError } from './errors';
import { atomSeries, numberSeries } from './observe';
import type { RecordedLog, RecordedSignal } from './types';

export interface Edge {
  /** s */
  t: number;
  rising: boolean;
}

export interface EdgePair {
  recordedS: number;
  simulatedS: number | null;
  /** Simulated − recorded, ms; null when the model has no matching edge. */
  errorMs: number | null;
}

export interface SignalComparison {
  tag: string;
  word: string;
  kind: 'state' | 'number';
  recordedEdges: Edge[];
  simulatedEdges: Edge[];
  pairs: EdgePair[];
  /** Largest |error| of a paired edge, ms (0 without pairs). */
  maxErrorMs: number;
  /** Recorded edges (and a differing initial state) the model does not reproduce. */
  missing: number;
  /** Simulated edges within the log that the machine did not record. */
  extra: number;
  /** Numbers only: RMS of how far each recorded value lies outside what the model passed through within ±divergenceMs, SI (Pa or m). */
  rmsError?: number;
}

export interface Divergence {
  t: number;
  tag: string;
  word: string;
  description: string;
}

export interface Comparison {
  signals: SignalComparison[];
  firstDivergence: Divergence | null;
  /** Mean penalty per comparison term, ms-equivalent: 0 = identical, larger worse (README, "Score"). */
  score: number;
  /** 100·exp(−score / 100 ms), %. */
  match: number;
  summary: string;
}

export interface CompareOptions {
  /** An edge off by more than this diverges, ms (default 50). */
  divergenceMs?: number;
  /** Penalty cap per edge and for a missing or extra edge, ms (default 500). */
  capMs?: number;
  /** Edges further apart than this are not paired, s (default 1). */
  pairWindowS?: number;
  /** Pressures differing by more than this diverge, Pa (default 0.3 bar, common practice for a shop-floor transducer reading). */
  pressureTolerancePa?: number;
  /** Positions differing by more than this diverge, m (default 2 mm, common practice for a linear transducer on a small cylinder). */
  positionToleranceM?: number;
}

export const COMPARE_DEFAULTS: Required<CompareOptions> = {
  divergenceMs: 50,
  capMs: 500,
  pairWindowS: 1,
  pressureTolerancePa: 30_000,
  positionToleranceM: 0.002,
};

/** The score at which match falls to 1/e (37 %), ms. */
const MATCH_SCALE_MS = 100;
const PA_PER_BAR = 100_000;

/**
 * Compares the log's observations with a simulated trace: state signals edge by edge (paired in
 * order, same direction, nearest within the window), numbers sample by sample against the band
 * the model passed through around each recorded time. Throws a ReplayError naming the tag and word when an observation cannot be read from
 * the drawing.
 */
export function compareRun(document: CircuitDocument, log: RecordedLog, trace: Trace, options: CompareOptions = {}): Comparison {
  const o = { ...COMPARE_DEFAULTS, ...options };
  const observations = log.signals.filter((s) => s.role === 'observation');
  if (observations.length === 0) throw new ReplayError('the log has no observations to compare: map at least one sensor or measurement as an observation');
  const terms: number[] = [];
  const divergences: Divergence[] = [];
  const signals: SignalComparison[] = [];
  const notes: string[] = [];
  let edgesRecorded = 0;
  let edgesWithin = 0;
  for (const signal of observations) {
    if (signal.times.length === 0) continue;
    if (signal.kind === 'state') {
      const result = compareState(document, log, trace, signal, o);
      signals.push(result.comparison);
      terms.push(...result.terms);
      divergences.push(...result.divergences);
      edgesRecorded += result.comparison.recordedEdges.length;
      edgesWithin += result.comparison.pairs.filter((p) => p.errorMs !== null && Math.abs(p.errorMs) <= o.divergenceMs).length;
    } else {
      const result = compareNumber(document, trace, signal, o);
      if (!result) continue;
      signals.push(result.comparison);
      terms.push(result.term);
      if (result.divergence) divergences.push(result.divergence);
      notes.push(result.note);
    }
  }
  const score = terms.length === 0 ? 0 : terms.reduce((a, b) => a + b, 0) / terms.length;
  const match = 100 * Math.exp(-score / MATCH_SCALE_MS);
  const firstDivergence = divergences.reduce<Divergence | null>((first, d) => (first === null || d.t < first.t ? d : first), null);
  const parts: string[] = [];
  if (edgesRecorded > 0) parts.push(`The model matches ${edgesWithin} of ${edgesRecorded} recorded sensor edges within ${o.divergenceMs} ms`);
  parts.push(...notes);
  const head = parts.length > 0 ? parts.join('; ') : 'Nothing recorded could be compared';
  const summary = firstDivergence ? `${head}; ${firstDivergence.description}.` : `${head}; no divergence beyond the tolerances.`;
  return { signals, firstDivergence, score, match, summary };
}

/** Edges of a 0/1 series; `at(i)` gives the moment of a change seen at sample i. */
function edgesOf(values: ArrayLike<number>, at: (i: number) => number): Edge[] {
  const edges: Edge[] = [];
  for (let i = 1; i < values.length; i += 1) {
    const before = values[i - 1]! > STATE_THRESHOLD;
    const now = values[i]! > STATE_THRESHOLD;
    if (now !== before) edges.push({ t: at(i), rising: now });
  }
  return edges;
}

function compareState(document: CircuitDocument, log: RecordedLog, trace: Trace, signal: RecordedSignal, o: Required<CompareOptions>) {
  const series = atomSeries(document, trace, signal.tag, signal.word);
  const time = trace.time;
  const recordedEdges = edgesOf(signal.values, (i) => signal.times[i]!);
  // A change lies somewhere between two output samples: the middle halves the worst error.
  const start = signal.times[0]!;
  const simulatedEdges = edgesOf(series, (i) => (time[i - 1]! + time[i]!) / 2).filter((e) => e.t >= start);
  const terms: number[] = [];
  const divergences: Divergence[] = [];
  const name = `${signal.tag} ${signal.word}`;
  let missing = 0;
  const initialSim = series[nearestIndex(time, start)]! > STATE_THRESHOLD;
  const initialRec = signal.values[0]! > STATE_THRESHOLD;
  if (initialSim !== initialRec) {
    missing += 1;
    terms.push(o.capMs);
    divergences.push({ t: start, tag: signal.tag, word: signal.word, description: `${signal.tag} is ${initialRec ? '' : 'not '}${signal.word} at the start of the log (${fmtS(start)}), the model ${initialSim ? 'is' : 'is not'}` });
  }
  const { pairs, used } = pairEdges(recordedEdges, simulatedEdges, o.pairWindowS);
  pairs.forEach((pair, i) => {
    const rising = recordedEdges[i]!.rising;
    const what = rising ? name : `${signal.tag} no longer ${signal.word}`;
    if (pair.errorMs === null) {
      missing += 1;
      terms.push(o.capMs);
      divergences.push({ t: pair.recordedS, tag: signal.tag, word: signal.word, description: `${what} at ${fmtS(pair.recordedS)} on the machine has no counterpart in the model within ${o.pairWindowS} s` });
      return;
    }
    terms.push(Math.min(Math.abs(pair.errorMs), o.capMs));
    if (Math.abs(pair.errorMs) > o.divergenceMs) {
      const late = pair.errorMs < 0 ? 'later' : 'earlier';
      divergences.push({
        t: Math.min(pair.recordedS, pair.simulatedS!),
        tag: signal.tag,
        word: signal.word,
        description: `${what} comes ${Math.round(Math.abs(pair.errorMs))} ms ${late} on the machine (${fmtS(pair.recordedS)}) than in the model (${fmtS(pair.simulatedS!)})`,
      });
    }
  });
  let extra = 0;
  simulatedEdges.forEach((edge, i) => {
    // After the log ends the machine's behaviour is unknown, so later model edges are no evidence.
    if (used[i] || edge.t > log.durationS) return;
    extra += 1;
    terms.push(o.capMs);
    const what = edge.rising ? name : `${signal.tag} no longer ${signal.word}`;
    divergences.push({ t: edge.t, tag: signal.tag, word: signal.word, description: `the model has ${what} at ${fmtS(edge.t)}, which the machine did not record` });
  });
  const errors = pairs.flatMap((p) => (p.errorMs === null ? [] : [Math.abs(p.errorMs)]));
  const comparison: SignalComparison = {
    tag: signal.tag,
    word: signal.word,
    kind: 'state',
    recordedEdges,
    simulatedEdges,
    pairs,
    maxErrorMs: errors.length > 0 ? Math.max(...errors) : 0,
    missing,
    extra,
  };
  return { comparison, terms, divergences };
}

/**
 * Pairs recorded with simulated edges of the same direction, in order: each recorded edge takes
 * the nearest unused simulated edge within the window that comes after the last one taken.
 * Returns one pair per recorded edge (in the recorded order) and which simulated edges were used.
 */
export function pairEdges(recorded: readonly Edge[], simulated: readonly Edge[], windowS: number): { pairs: EdgePair[]; used: boolean[] } {
  const used = simulated.map(() => false);
  const next = { rising: 0, falling: 0 };
  const pairs = recorded.map((r): EdgePair => {
    const dir = r.rising ? 'rising' : 'falling';
    let best = -1;
    for (let k = next[dir]; k < simulated.length && simulated[k]!.t <= r.t + windowS; k += 1) {
      const s = simulated[k]!;
      if (s.rising !== r.rising || used[k] || s.t < r.t - windowS) continue;
      if (best < 0 || Math.abs(s.t - r.t) < Math.abs(simulated[best]!.t - r.t)) best = k;
    }
    if (best < 0) return { recordedS: r.t, simulatedS: null, errorMs: null };
    used[best] = true;
    next[dir] = best + 1;
    const s = simulated[best]!.t;
    return { recordedS: r.t, simulatedS: s, errorMs: (s - r.t) * 1000 };
  });
  return { pairs, used };
}

function compareNumber(document: CircuitDocument, trace: Trace, signal: RecordedSignal, o: Required<CompareOptions>) {
  const column = numberSeries(document, trace, signal);
  const pressure = signal.word.startsWith('pressure:');
  const tolerance = pressure ? o.pressureTolerancePa : o.positionToleranceM;
  const end = trace.time[trace.time.length - 1] ?? 0;
  let sum = 0;
  let count = 0;
  let worst: { t: number; diff: number } | null = null;
  const windowS = o.divergenceMs / 1000;
  signal.times.forEach((t, i) => {
    if (t > end) return;
    const diff = 'constant' in column ? column.constant - signal.values[i]! : offBand(trace.time, column.values, t, windowS, signal.values[i]!);
    sum += diff * diff;
    count += 1;
    if (worst === null && Math.abs(diff) > tolerance) worst = { t, diff };
  });
  if (count === 0) return null;
  const rms = Math.sqrt(sum / count);
  const label = pressure ? `pressure at ${signal.tag}.${signal.word.slice('pressure:'.length)}` : `${signal.tag} position`;
  const show = (v: number) => (pressure ? `${(v / PA_PER_BAR).toFixed(2)} bar` : `${(v * 1000).toFixed(1)} mm`);
  const first = worst as { t: number; diff: number } | null;
  const divergence: Divergence | null = first
    ? { t: first.t, tag: signal.tag, word: signal.word, description: `${label} differs from the model by ${show(Math.abs(first.diff))} at ${fmtS(first.t)} (tolerance ${show(tolerance)})` }
    : null;
  const comparison: SignalComparison = { tag: signal.tag, word: signal.word, kind: 'number', recordedEdges: [], simulatedEdges: [], pairs: [], maxErrorMs: 0, missing: 0, extra: 0, rmsError: rms };
  return {
    comparison,
    // An RMS error equal to the tolerance weighs as much as an edge off by the divergence threshold.
    term: Math.min(o.capMs, (o.divergenceMs * rms) / tolerance),
    divergence,
    note: `${label} within ${show(rms)} RMS of the model`,
  };
}

function nearestIndex(time: readonly number[], t: number): number {
  let lo = 0;
  let hi = time.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (time[mid]! < t) lo = mid + 1;
    else hi = mid;
  }
  return lo > 0 && Math.abs(time[lo - 1]! - t) <= Math.abs(time[lo]! - t) ? lo - 1 : lo;
}

/**
 * How far a recorded value lies outside what the model passed through within ±window of its time
 * (0 when inside), signed as model − recorded. Timestamps on a machine and in a model differ by a
 * few ms, so a pressure rising through 3 bar in 20 ms would otherwise read as bars apart; the same
 * window as for edges keeps a timing offset from counting twice, once as time and once as value.
 */
function offBand(time: readonly number[], values: readonly number[], t: number, windowS: number, recorded: number): number {
  let low = Math.min(interpolate(time, values, t - windowS), interpolate(time, values, t + windowS));
  let high = Math.max(interpolate(time, values, t - windowS), interpolate(time, values, t + windowS));
  for (let k = nearestIndex(time, t - windowS); k < time.length && time[k]! <= t + windowS; k += 1) {
    if (time[k]! < t - windowS) continue;
    low = Math.min(low, values[k]!);
    high = Math.max(high, values[k]!);
  }
  return recorded < low ? low - recorded : recorded > high ? high - recorded : 0;
}

/** Linear interpolation in a sampled column; held constant beyond its ends. */
export function interpolate(time: readonly number[], values: readonly number[], t: number): number {
  const n = time.length;
  if (n === 0) return NaN;
  if (t <= time[0]!) return values[0]!;
  if (t >= time[n - 1]!) return values[n - 1]!;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (time[mid]! <= t) lo = mid;
    else hi = mid;
  }
  const f = (t - time[lo]!) / (time[hi]! - time[lo]!);
  return values[lo]! + f * (values[hi]! - values[lo]!);
}

/** Milliseconds shown, trailing zeros dropped: "0.995 s", "2.5 s". */
function fmtS(s: number): string {
  return `${Number(s.toFixed(3))} s`;
}
