import type { TraceEvent } from '@/engine/trace/trace';
import type { RunTrace } from './run-frame';

/**
 * The rows of a live run as they arrive from the worker, one growing column per signal.
 * Values are kept in single precision (a pressure to about 0.05 Pa, a position to well under a
 * micrometre), which halves the memory of a long run; time stays in double precision.
 */
export class LiveTrace {
  readonly names: string[];
  readonly intervalS: number;
  readonly events: TraceEvent[] = [];
  private time: Float64Array;
  private columns: Float32Array[];
  private rows = 0;
  private readonly pressureColumns: number[];
  /** The highest pressure any port has had so far, Pa absolute (0 before the first row). */
  highestPa = 0;

  constructor(names: readonly string[], intervalS: number, capacity = 1024) {
    this.names = [...names];
    this.intervalS = intervalS;
    this.time = new Float64Array(capacity);
    this.columns = names.map(() => new Float32Array(capacity));
    this.pressureColumns = names.flatMap((name, i) => (name.includes(':p:') ? [i] : []));
  }

  get length(): number {
    return this.rows;
  }

  /** Machine time of the last row, s (0 before the first). */
  get lastTime(): number {
    return this.rows === 0 ? 0 : this.time[this.rows - 1]!;
  }

  /** Adds rows that follow on from those held: `first` must be the next row's index. */
  append(first: number, time: Float64Array, values: Float64Array, events: readonly TraceEvent[] = []): void {
    if (first !== this.rows) throw new Error(`rows out of order: expected row ${this.rows}, got ${first}`);
    const width = this.names.length;
    const count = time.length;
    if (values.length !== count * width) throw new Error(`expected ${count * width} values for ${count} rows, got ${values.length}`);
    this.reserve(this.rows + count);
    this.time.set(time, this.rows);
    for (let r = 0; r < count; r += 1) {
      const base = r * width;
      for (let c = 0; c < width; c += 1) this.columns[c]![this.rows + r] = values[base + c]!;
      for (const c of this.pressureColumns) this.highestPa = Math.max(this.highestPa, values[base + c]!);
    }
    this.rows += count;
    this.events.push(...events);
  }

  /** The rows held so far as a trace (views, not copies: valid until the next append). */
  view(): RunTrace {
    return {
      intervalS: this.intervalS,
      time: this.time.subarray(0, this.rows),
      names: this.names,
      columns: this.columns.map((c) => c.subarray(0, this.rows)),
      highestPa: this.highestPa,
    };
  }

  private reserve(rows: number): void {
    if (rows <= this.time.length) return;
    let capacity = this.time.length;
    while (capacity < rows) capacity *= 2;
    const time = new Float64Array(capacity);
    time.set(this.time.subarray(0, this.rows));
    this.time = time;
    this.columns = this.columns.map((old) => {
      const grown = new Float32Array(capacity);
      grown.set(old.subarray(0, this.rows));
      return grown;
    });
  }
}
