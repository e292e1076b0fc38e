import type { CircuitDocument } from '../document/schema';
import type { InputEvent } from '../solver/simulate';
import type { Trace } from '../trace/trace';
import { interpolate } from './compare';
import { atomSeries, numberSeries } from './observe';
import type { RecordedLog, RecordedSignal } from './types';

/** A deterministic pseudo-random source in [0, 1): mulberry32 (T. Ettinger's public-domain 32-bit generator). */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

export interface RecordOptions {
  /** Seed of the jitter and noise (default 1). */
  seed?: number;
  /** Edges move by up to ± this, s (default 0: none). */
  jitterS?: number;
  /** Pressures get uniform noise of ± this, Pa (default 0). */
  pressureNoisePa?: number;
  /** Positions get uniform noise of ± this, m (default 0). */
  positionNoiseM?: number;
  /** Sample interval of number signals, s (default 0.02, a typical data-logger rate, common practice). */
  sampleS?: number;
}

/**
 * Turns a simulated run into a field log as a data logger would have written it: commands from
 * the inputs that drove it (press/release or set 1/0), states as change points, numbers sampled
 * at a fixed rate; optionally with seeded timestamp jitter and measurement noise. For tests of
 * the replay and for demo logs.
 */
export function recordTrace(
  document: CircuitDocument,
  trace: Trace,
  inputs: readonly InputEvent[],
  spec: { commands: Array<{ tag: string; word: string }>; observations: Array<{ tag: string; word: string; kind: 'state' | 'number' }>; durationS: number },
  options: RecordOptions = {},
): RecordedLog {
  const random = mulberry32(options.seed ?? 1);
  const jitter = (t: number) => Math.max(0, t + (options.jitterS ?? 0) * (2 * random() - 1));
  const signals: RecordedSignal[] = [];
  for (const { tag, word } of spec.commands) {
    const own = inputs.filter((input) => input.component === tag && input.t <= spec.durationS);
    let active = 0;
    const times = [0];
    const values = [0];
    for (const input of own) {
      active = input.action === 'set' ? ((input.value ?? 0) > 0 ? 1 : 0) : input.action === 'press' ? 1 : input.action === 'release' ? 0 : 1 - active;
      times.push(input.t);
      values.push(active);
    }
    signals.push({ tag, word, role: 'command', kind: 'state', times, values });
  }
  for (const { tag, word, kind } of spec.observations) {
    if (kind === 'state') {
      const series = atomSeries(document, trace, tag, word);
      const times = [0];
      const values = [series[0]!];
      for (let i = 1; i < series.length && trace.time[i]! <= spec.durationS; i += 1) {
        if (series[i] === series[i - 1]) continue;
        times.push(jitter((trace.time[i - 1]! + trace.time[i]!) / 2));
        values.push(series[i]!);
      }
      signals.push({ tag, word, role: 'observation', kind, times, values });
      continue;
    }
    const column = numberSeries(document, trace, { tag, word, role: 'observation', kind, times: [], values: [] });
    const noise = word === 'position' ? (options.positionNoiseM ?? 0) : (options.pressureNoisePa ?? 0);
    const step = options.sampleS ?? 0.02;
    const times: number[] = [];
    const values: number[] = [];
    for (let k = 0; k * step <= spec.durationS + 1e-9; k += 1) {
      const t = k * step;
      const value = 'constant' in column ? column.constant : interpolate(trace.time, column.values, t);
      times.push(t);
      values.push(value + noise * (2 * random() - 1));
    }
    signals.push({ tag, word, role: 'observation', kind, times, values });
  }
  return { signals, durationS: spec.durationS };
}
