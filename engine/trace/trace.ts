/**
 * The trace: one format for live runs, saved runs, proofs and replays.
 * Columnar samples at a fixed output interval, plus the discrete events
 * located in time. SI units; the UI converts for display.
 */
export const TRACE_FORMAT_VERSION = 1 as const;

export type SignalUnit = 'Pa' | 'm' | 'm/s' | 'kg/s' | 'state';

export interface TraceSignal {
  /** `<componentId>:<quantity>[:<port or passage>]`, e.g. `press:x`, `main:p:4`, `fc:q:throttle`. */
  name: string;
  unit: SignalUnit;
  values: number[];
}

export interface TraceEvent {
  /** Time of the event, s (located within the solver's event tolerance). */
  t: number;
  componentId: string;
  kind: string;
  detail?: string;
}

export interface TraceStats {
  steps: number;
  rejectedSteps: number;
  /** Sum over mass-holding nodes and boundaries of the air budget error, kg (should be round-off). */
  massBalanceErrorKg: number;
}

export interface Trace {
  formatVersion: typeof TRACE_FORMAT_VERSION;
  intervalS: number;
  time: number[];
  signals: TraceSignal[];
  events: TraceEvent[];
  stats: TraceStats;
}

/** Where samples go while a simulation runs; the browser, server and tests each bring their own. */
export interface TraceSink {
  begin(signals: ReadonlyArray<{ name: string; unit: SignalUnit }>): void;
  /** One row: `values` holds exactly one value per signal, in the order `begin` gave them. */
  sample(t: number, values: Float64Array): void;
  event(event: TraceEvent): void;
}

/** A sink that keeps everything in memory and hands back a Trace. */
export class MemoryTraceSink implements TraceSink {
  private readonly time: number[] = [];
  private names: ReadonlyArray<{ name: string; unit: SignalUnit }> = [];
  /** Rows as they come, in blocks of ROWS_PER_BLOCK; turned into one array per signal at the end. */
  private readonly blocks: Float64Array[] = [];
  private readonly events: TraceEvent[] = [];

  begin(signals: ReadonlyArray<{ name: string; unit: SignalUnit }>): void {
    this.names = signals;
  }

  sample(t: number, values: Float64Array): void {
    const width = this.names.length;
    const row = this.time.length % ROWS_PER_BLOCK;
    if (row === 0) this.blocks.push(new Float64Array(ROWS_PER_BLOCK * width));
    if (values.length !== width) throw new RangeError(`a trace row has one value per signal (${width}), got ${values.length}`);
    this.blocks[this.blocks.length - 1]!.set(values, row * width);
    this.time.push(t);
  }

  event(event: TraceEvent): void {
    this.events.push(event);
  }

  toTrace(intervalS: number, stats: TraceStats): Trace {
    const width = this.names.length;
    const rows = this.time.length;
    const signals: TraceSignal[] = this.names.map((s, i) => {
      const values = new Array<number>(rows);
      let k = 0;
      for (const block of this.blocks) {
        const end = Math.min(rows, k + ROWS_PER_BLOCK);
        for (let at = i; k < end; k += 1, at += width) values[k] = block[at]!;
      }
      return { name: s.name, unit: s.unit, values };
    });
    return { formatVersion: TRACE_FORMAT_VERSION, intervalS, time: this.time, signals, events: this.events, stats };
  }
}

/** Rows a MemoryTraceSink keeps per block: a sample is one contiguous copy, not a push per signal. */
const ROWS_PER_BLOCK = 256;

/** Looks a signal up by name; undefined when the trace has none. */
export function signal(trace: Trace, name: string): TraceSignal | undefined {
  return trace.signals.find((s) => s.name === name);
}

/** The trace's samples as CSV: a `time_s` column, then one column per signal with its unit. */
export function traceToCsv(trace: Trace): string {
  const header = ['time_s', ...trace.signals.map((s) => `${s.name} [${s.unit}]`)];
  const rows = trace.time.map((t, i) => [formatNumber(t), ...trace.signals.map((s) => formatNumber(s.values[i]!))].join(','));
  return `${[header.map(csvField).join(','), ...rows].join('\n')}\n`;
}

function formatNumber(x: number): string {
  return Number.isInteger(x) ? String(x) : x.toPrecision(10).replace(/\.?0+(e|$)/, '$1');
}

function csvField(text: string): string {
  return /[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
