import type { CircuitDocument } from '@/engine/document/schema';
import type { RunTrace } from './run-frame';

/** A signal of a run as a plot shows it: label with the part's tag, unit, and the conversion from SI. */
export interface PlotSignal {
  name: string;
  label: string;
  unit: string;
  fromSi: (value: number) => number;
}

/**
 * The plottable signals of a run: pressure at every port (bar gauge), piston travel (mm) and
 * speed (mm/s), and the discrete states (valve position, coil, contact) as their numbers.
 * Flows are left out of the list: they are in the CSV.
 */
export function plotSignals(trace: RunTrace, document: CircuitDocument): PlotSignal[] {
  const tags = new Map(document.components.map((c) => [c.id, c.tag]));
  const ambient = document.settings.ambientPressurePa;
  const out: PlotSignal[] = [];
  for (const name of trace.names) {
    const [id, kind, port] = name.split(':') as [string, string, string | undefined];
    // Wires' live flags are for the drawing; the plot is about parts.
    const tag = tags.get(id);
    if (tag === undefined) continue;
    if (kind === 'p' && port !== undefined) out.push({ name, label: `${tag} port ${port}`, unit: 'bar (gauge)', fromSi: (pa) => (pa - ambient) / 1e5 });
    else if (kind === 'x') out.push({ name, label: `${tag} position`, unit: 'mm', fromSi: (m) => m * 1000 });
    else if (kind === 'v') out.push({ name, label: `${tag} speed`, unit: 'mm/s', fromSi: (ms) => ms * 1000 });
    else if (kind !== 'q' && port === undefined) out.push({ name, label: `${tag} ${kind}`, unit: 'state', fromSi: (s) => s });
  }
  return out;
}

/**
 * The run so far as CSV: time in s, then every signal in SI units. The page keeps values in single
 * precision, so they are written to the seven significant digits that holds (not the float's noise).
 */
export function runCsv(trace: RunTrace): string {
  const header = ['time_s', ...trace.names].join(',');
  const lines = [header];
  for (let k = 0; k < trace.time.length; k += 1) {
    lines.push([trace.time[k]!, ...trace.columns.map((c) => Number(c[k]!.toPrecision(7)))].join(','));
  }
  return `${lines.join('\n')}\n`;
}
