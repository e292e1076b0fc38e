import { componentTypeById } from '@/engine/components/registry';
import { parameterDefaults } from '@/engine/components/types';
import { RHO_0_KG_PER_M3 } from '@/engine/calc/constants';
import type { CircuitDocument } from '@/engine/document/schema';
import type { FlowColumns, SignedColumn } from './flow-columns';

/** A run as the page holds it: one column per signal, rows every `intervalS`. */
export interface RunTrace {
  intervalS: number;
  time: Float64Array;
  names: string[];
  columns: Array<Float32Array | Float64Array>;
  /** The highest port pressure in these rows, Pa absolute. */
  highestPa: number;
}

/** What one component shows at a moment of the run. */
export interface ComponentRunState {
  activePosition?: number;
  extension?: number;
  energised?: boolean;
  state?: string;
}

/** The drawing at playback time t. */
export interface RunFrame {
  t: number;
  components: Map<string, ComponentRunState>;
  /** Gauge pressure in each tube, bar. */
  tubeBar: Map<string, number>;
  /** Air entering each tube at its first end, l/min of free air (ISO 8778 reference atmosphere); negative when it flows back. */
  tubeFlow: Map<string, number>;
  /** Gauge pressure at every port the run reports, keyed `component:port`, bar. */
  portBar: Map<string, number>;
  /** Air leaving the part at each port with passages onto it, l/min of free air; negative when it goes in. Keyed `component:port`. */
  portFlow: Map<string, number>;
  /** Wires at + potential. */
  liveWires: Set<string>;
  highestBar: number;
}

/** kg/s of air to l/min of free air at the ISO 8778 reference atmosphere (1.185 kg/m³). */
const KG_PER_S_TO_ANR_L_PER_MIN = 60_000 / RHO_0_KG_PER_M3;

/** Where one part's shown state comes from: trace columns by index (-1: the trace has none). */
interface PartReading {
  id: string;
  position: number;
  travel: number;
  strokeM: number;
  energised: number;
  worked: number;
  /** Which name the worked state goes by: sensors are 'actuated', switches 'operated'. */
  workedState: 'actuated' | 'operated';
}

/**
 * A run made ready for playback: which columns each part and tube reads. Worked out once per
 * run (the signal names do not change while it goes on), so that a frame only reads one row.
 */
export interface PreparedRun {
  parts: PartReading[];
  tubes: Array<{ id: string; column: number; flows: readonly SignedColumn[] }>;
  ports: Array<{ key: string; column: number; flows: readonly SignedColumn[] }>;
  wires: Array<{ id: string; column: number }>;
  ambientPa: number;
  /** The highest supply set pressure, bar gauge: the pressure ramp reaches at least this far. */
  supplyBar: number;
}

export function prepareRun(names: readonly string[], document: CircuitDocument, flows: FlowColumns = { ports: {}, tubes: {} }): PreparedRun {
  const index = new Map(names.map((name, i) => [name, i]));
  const column = (name: string) => index.get(name) ?? -1;
  const ambientPa = document.settings.ambientPressurePa;
  const parts = document.components.map((c): PartReading => {
    const type = componentTypeById(c.type);
    const actuated = column(`${c.id}:actuated`);
    return {
      id: c.id,
      position: column(`${c.id}:position`),
      travel: column(`${c.id}:x`),
      strokeM: Number(c.parameters.stroke ?? (type ? parameterDefaults(type).stroke : undefined)),
      energised: index.get(`${c.id}:energised`) ?? column(`${c.id}:lit`),
      worked: index.get(`${c.id}:operated`) ?? actuated,
      workedState: actuated >= 0 ? 'actuated' : 'operated',
    };
  });
  const tubes = document.tubes
    .map((t) => ({ id: t.id, column: column(`${t.from.component}:p:${t.from.port}`), flows: flows.tubes[t.id] ?? [] }))
    .filter((t) => t.column >= 0);
  const ports = names.flatMap((name, i) => {
    const [component, kind, port] = name.split(':');
    const key = `${component}:${port}`;
    return kind === 'p' && port !== undefined ? [{ key, column: i, flows: flows.ports[key] ?? [] }] : [];
  });
  const wires = document.wires.map((w) => ({ id: w.id, column: column(`${w.id}:live`) })).filter((w) => w.column >= 0);
  // The ramp's scale starts from the supplies' set pressure, so colours keep their meaning as the run
  // goes on; it grows only if some port goes higher still.
  const supplyBar = Math.max(0, ...document.components.filter((c) => c.type === 'air-supply').map((c) => Number(c.parameters.pressure ?? 0) / 1e5));
  return { parts, tubes, ports, wires, ambientPa, supplyBar };
}

/** Reads a run at time t (the nearest row at or before it), mapped onto the drawing's parts. */
export function frameAt(run: PreparedRun, trace: RunTrace, t: number): RunFrame {
  const rows = trace.time.length;
  const k = rows === 0 ? -1 : Math.min(rows - 1, Math.max(0, Math.floor(t / trace.intervalS + 1e-9)));
  const read = (i: number): number | undefined => (i < 0 || k < 0 ? undefined : trace.columns[i]![k]);
  const components = new Map<string, ComponentRunState>();
  for (const part of run.parts) {
    const shown = partState(part, read);
    if (shown) components.set(part.id, shown);
  }
  const tubeBar = new Map<string, number>();
  /** Free-air flow summed over signed columns at row k, l/min; undefined with no columns. */
  const flowOf = (columns: readonly SignedColumn[]): number | undefined => {
    if (columns.length === 0 || k < 0) return undefined;
    let kgPerS = 0;
    for (const [c, sign] of columns) kgPerS += sign * trace.columns[c]![k]!;
    return kgPerS * KG_PER_S_TO_ANR_L_PER_MIN;
  };
  const tubeFlow = new Map<string, number>();
  for (const tube of run.tubes) {
    const p = read(tube.column);
    if (p !== undefined) tubeBar.set(tube.id, (p - run.ambientPa) / 1e5);
    const q = flowOf(tube.flows);
    if (q !== undefined) tubeFlow.set(tube.id, q);
  }
  const portBar = new Map<string, number>();
  const portFlow = new Map<string, number>();
  for (const port of run.ports) {
    const p = read(port.column);
    if (p !== undefined) portBar.set(port.key, (p - run.ambientPa) / 1e5);
    const q = flowOf(port.flows);
    if (q !== undefined) portFlow.set(port.key, q);
  }
  const liveWires = new Set<string>();
  for (const wire of run.wires) if ((read(wire.column) ?? 0) > 0.5) liveWires.add(wire.id);
  const highestBar = Math.max(run.supplyBar, trace.highestPa > 0 ? (trace.highestPa - run.ambientPa) / 1e5 : 0);
  return { t: k < 0 ? 0 : trace.time[k]!, components, tubeBar, tubeFlow, portBar, portFlow, liveWires, highestBar };
}

function partState(part: PartReading, read: (column: number) => number | undefined): ComponentRunState | null {
  const position = read(part.position);
  if (position !== undefined) return { activePosition: position };
  const x = read(part.travel);
  if (x !== undefined) return part.strokeM > 0 ? { extension: x / part.strokeM } : null;
  const energised = read(part.energised);
  const worked = read(part.worked);
  if (energised === undefined && worked === undefined) return null;
  return {
    ...(energised !== undefined ? { energised: energised > 0.5 } : {}),
    ...(worked !== undefined && worked > 0.5 ? { state: part.workedState } : {}),
  };
}
