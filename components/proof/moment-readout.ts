import { componentTypeById } from '@/engine/components/registry';
import type { CircuitDocument } from '@/engine/document/schema';
import type { Trace } from '@/engine/trace/trace';

export interface MomentLine {
  tag: string;
  text: string;
}

/** A piston moving slower than this counts as still, m/s (the rule language's own threshold for "is extending": 1 mm/s). */
const STILL_M_PER_S = 0.001;

/**
 * What the parts named by a rule were doing at one moment of a run, in the UI's units: a cylinder's
 * position in mm and whether it moves out, in or not at all; a valve's position by the name its
 * type gives it; other states as yes/no. The row shown is the last sample at or before t.
 */
export function momentReadout(trace: Trace, document: CircuitDocument, tags: readonly string[], t: number): MomentLine[] {
  if (trace.time.length === 0) return [];
  let row = Math.floor((t - trace.time[0]!) / trace.intervalS + 1e-9);
  row = Math.max(0, Math.min(trace.time.length - 1, row));
  const lines: MomentLine[] = [];
  for (const tag of tags) {
    const component = document.components.find((c) => c.tag === tag);
    if (!component) continue;
    const parts: string[] = [];
    const positionNames = componentTypeById(component.type)?.states ?? [];
    const signal = (kind: string) => trace.signals.find((s) => s.name === `${component.id}:${kind}`);
    const x = signal('x');
    const v = signal('v');
    if (x) parts.push(`position ${(x.values[row]! * 1000).toFixed(1)} mm`);
    if (v) {
      const speed = v.values[row]!;
      parts.push(speed > STILL_M_PER_S ? 'moving out' : speed < -STILL_M_PER_S ? 'moving in' : 'still');
    }
    for (const s of trace.signals) {
      const [id, kind, port] = s.name.split(':');
      if (id !== component.id || s.unit !== 'state' || port !== undefined) continue;
      const value = s.values[row]!;
      parts.push(kind === 'position' ? `in position ‘${positionNames[value] ?? value}’` : `${kind} ${value ? 'yes' : 'no'}`);
    }
    if (parts.length) lines.push({ tag, text: parts.join(', ') });
  }
  return lines;
}
