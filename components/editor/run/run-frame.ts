import { componentTypeById } from '@/engine/components/registry';
import { parameterDefaults } from '@/engine/components/types';
import type { CircuitComponent, CircuitDocument } from '@/engine/document/schema';

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

/** Reads a trace at time t (the nearest row at or before it), mapped onto the drawing's parts. */
export function frameAt(trace: RunTrace, document: CircuitDocument, t: number): RunFrame {
  const rows = trace.time.length;
  const k = rows === 0 ? -1 : Math.min(rows - 1, Math.max(0, Math.floor(t / trace.intervalS + 1e-9)));
  const index = new Map(trace.names.map((name, i) => [name, i]));
  const read = (name: string): number | undefined => {
    const i = index.get(name);
    return i === undefined || k < 0 ? undefined : trace.columns[i]![k];
  };
  const ambient = document.settings.ambientPressurePa;
  const components = new Map<string, ComponentRunState>();
  for (const c of document.components) {
    const shown = componentState(c, read);
    if (shown) components.set(c.id, shown);
  }
  const tubeBar = new Map<string, number>();
  let highestBar = 0;
  for (const tube of document.tubes) {
    const p = read(`${tube.from.component}:p:${tube.from.port}`);
    if (p === undefined) continue;
    const bar = (p - ambient) / 1e5;
    tubeBar.set(tube.id, bar);
  }
  // The ramp's scale comes from the whole run, so colours do not change meaning as it plays.
  for (const [i, name] of trace.names.entries()) {
    if (!name.includes(':p:')) continue;
    for (const p of trace.columns[i]!) highestBar = Math.max(highestBar, (p - ambient) / 1e5);
  }
  return { t: k < 0 ? 0 : trace.time[k]!, components, tubeBar, highestBar };
}

function componentState(component: CircuitComponent, read: (name: string) => number | undefined): ComponentRunState | null {
  const id = component.id;
  const position = read(`${id}:position`);
  if (position !== undefined) return { activePosition: position };
  const x = read(`${id}:x`);
  if (x !== undefined) {
    const type = componentTypeById(component.type);
    const stroke = Number(component.parameters.stroke ?? (type ? parameterDefaults(type).stroke : undefined));
    return stroke > 0 ? { extension: x / stroke } : null;
  }
  const energised = read(`${id}:energised`) ?? read(`${id}:lit`);
  const worked = read(`${id}:operated`) ?? read(`${id}:actuated`);
  if (energised === undefined && worked === undefined) return null;
  return {
    ...(energised !== undefined ? { energised: energised > 0.5 } : {}),
    ...(worked !== undefined && worked > 0.5 ? { state: read(`${id}:actuated`) !== undefined ? 'actuated' : 'operated' } : {}),
  };
}

/** How a click on a part works it during a run: held while pressed, switched over, or not at all. */
export type ManualOperation = 'hold' | 'switch' | 'emergency-stop' | null;

export function manualOperation(component: CircuitComponent): ManualOperation {
  const type = componentTypeById(component.type);
  if (!type) return null;
  if (component.type === 'pushbutton-no' || component.type === 'pushbutton-nc') return 'hold';
  if (component.type === 'selector-switch') return 'switch';
  if (component.type === 'emergency-stop') return 'emergency-stop';
  if (!type.positions) return null;
  const actuation = String(component.parameters.actuation ?? parameterDefaults(type).actuation);
  if (actuation === 'pushbutton' || actuation === 'mushroom') return 'hold';
  if (actuation === 'lever-detent' || actuation === 'selector-detent') return 'switch';
  return null;
}
