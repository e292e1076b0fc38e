import { componentTypeById } from '@/engine/components/registry';
import { parameterDefaults } from '@/engine/components/types';
import type { CircuitDocument } from '@/engine/document/schema';

/** A finished simulation as the page keeps it: one column per signal, rows every `intervalS`. */
export interface RunTrace {
  intervalS: number;
  time: Float64Array;
  names: string[];
  columns: Float64Array[];
}

/** What one component shows at a moment of the run. */
export interface ComponentRunState {
  activePosition?: number;
  extension?: number;
  energised?: boolean;
  state?: string;
}

/** The drawing at playback time t: component states, and the gauge pressure at every tube, bar. */
export interface RunFrame {
  t: number;
  components: Map<string, ComponentRunState>;
  tubeBar: Map<string, number>;
  highestBar: number;
}

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
 * A trace made ready for playback: which columns each part and tube reads, and the run's
 * highest pressure. Worked out once per trace, so that a frame only reads one row.
 */
export interface PreparedRun {
  trace: RunTrace;
  parts: PartReading[];
  tubes: Array<{ id: string; column: number }>;
  ambientPa: number;
  highestBar: number;
}

export function prepareRun(trace: RunTrace, document: CircuitDocument): PreparedRun {
  const index = new Map(trace.names.map((name, i) => [name, i]));
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
  const tubes = document.tubes.map((t) => ({ id: t.id, column: column(`${t.from.component}:p:${t.from.port}`) })).filter((t) => t.column >= 0);
  // The ramp's scale comes from the whole run, so colours do not change meaning as it plays.
  let highestBar = 0;
  for (const [i, name] of trace.names.entries()) {
    if (!name.includes(':p:')) continue;
    for (const p of trace.columns[i]!) highestBar = Math.max(highestBar, (p - ambientPa) / 1e5);
  }
  return { trace, parts, tubes, ambientPa, highestBar };
}

/** Reads a prepared run at time t (the nearest row at or before it), mapped onto the drawing's parts. */
export function frameAt(run: PreparedRun, t: number): RunFrame {
  const { trace } = run;
  const rows = trace.time.length;
  const k = rows === 0 ? -1 : Math.min(rows - 1, Math.max(0, Math.floor(t / trace.intervalS + 1e-9)));
  const read = (i: number): number | undefined => (i < 0 || k < 0 ? undefined : trace.columns[i]![k]);
  const components = new Map<string, ComponentRunState>();
  for (const part of run.parts) {
    const shown = partState(part, read);
    if (shown) components.set(part.id, shown);
  }
  const tubeBar = new Map<string, number>();
  for (const tube of run.tubes) {
    const p = read(tube.column);
    if (p !== undefined) tubeBar.set(tube.id, (p - run.ambientPa) / 1e5);
  }
  return { t: k < 0 ? 0 : trace.time[k]!, components, tubeBar, highestBar: run.highestBar };
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
