/**
 * The sequence a machine went through in one run, read from its trace: the material of a
 * displacement-step diagram (VDI 3260 practice) and of a GRAFCET-style step list (IEC 60848
 * words: step, transition, action). It describes what was observed, not a controller program.
 *
 * A step boundary is an instant at which some actuator starts, reaches an end position or stops
 * (trace events `started`, `end-position`, `stopped`). Step 0 is the initial situation, from the
 * start of the run to the first boundary; step k runs from boundary k−1 to boundary k. After the
 * last boundary every actuator is at rest, which closes the sequence; only a run that ends while
 * something still moves gets a last step ending with the trace.
 */
import { componentTypeById } from '../components/registry';
import type { CircuitDocument } from '../document/schema';
import type { Trace, TraceEvent } from '../trace/trace';

/** Where an actuator is: 0 retracted (start), 1 extended (end), `mid` anywhere between. */
export type EndPosition = 0 | 1 | 'mid';

export interface SequenceActuator {
  componentId: string;
  tag: string;
  /** The component's label, or its type's when it has none. */
  label: string;
  initial: EndPosition;
  /** Position at the start of the run as a fraction of the stroke (or swivel angle), 0…1. */
  initialLevel: number;
}

export interface SequenceMotion {
  componentId: string;
  tag: string;
  /** `out` towards the extended end, `in` towards the retracted end. */
  direction: 'out' | 'in';
  from: EndPosition;
  to: EndPosition;
  /** Position at the step's start and end as a fraction of the stroke, 0…1 (for drawing). */
  fromLevel: number;
  toLevel: number;
}

export interface SequenceStep {
  /** 0 for the initial situation, then 1, 2, … */
  index: number;
  /** Start and end of the step, s from the start of the run. */
  startS: number;
  endS: number;
  /** Actuators moving during the step, in the order of `actuators`; empty for a dwell. */
  motions: SequenceMotion[];
  /**
   * What was observed to end the previous step: the latest input, sensor or timer edge before
   * the step's first motion started ("S1 pressed", "1B2 on", "KT1 time elapsed"), or the
   * arrival that opened it ("1A1 reached its end (extended)"). Null for step 0 and when nothing
   * observable preceded it.
   */
  trigger: string | null;
  /** The part behind the trigger (the last one named when it names several), for a signal line; null with no trigger. */
  cause: { componentId: string; tag: string } | null;
}

export interface ObservedSequence {
  /** Every actuator of the circuit, in tag order (1A1, 1A2, 2A1 …): the rows of the diagram. */
  actuators: SequenceActuator[];
  steps: SequenceStep[];
}

export interface SequenceOptions {
  /**
   * Boundaries closer than this count as one instant, s. Default 1 ms: far below what a step
   * diagram can show, above the solver's event location tolerance.
   */
  sameInstantS?: number;
}

const NO_TRIGGER = { trigger: null, cause: null } as const;

/** Fraction of the stroke within which an actuator counts as at an end at the start of the run (common practice for end-position sensing). */
const END_BAND = 0.01;

interface Segment {
  actuator: number;
  componentId: string;
  tag: string;
  direction: 'out' | 'in';
  startS: number;
  endS: number | null;
  end: EndPosition;
}

/** A motion with the steps it spans (first…last) and where it started from. */
interface SegmentSpan {
  segment: Segment;
  first: number;
  last: number;
  from: { at: EndPosition; level: number };
}

/** Reads the observed sequence of a run of `document` from its trace. */
export function observedSequence(document: CircuitDocument, trace: Trace, options: SequenceOptions = {}): ObservedSequence {
  const sameInstantS = options.sameInstantS ?? 1e-3;
  const endS = trace.time.length ? trace.time[trace.time.length - 1]! : 0;
  const startS = trace.time.length ? trace.time[0]! : 0;
  const byId = new Map(document.components.map((c) => [c.id, c]));

  const parts = document.components
    .filter((c) => componentTypeById(c.type)?.category === 'actuator')
    .sort((a, b) => a.tag.localeCompare(b.tag, 'en', { numeric: true }));
  const levelAt = parts.map((c) => levelReader(trace, c.id, strokeOf(c)));
  const actuators: SequenceActuator[] = parts.map((c, i) => {
    const level = levelAt[i]!(startS);
    const initial = endOf(level);
    return { componentId: c.id, tag: c.tag, label: c.label ?? componentTypeById(c.type)!.label, initial, initialLevel: initial === 'mid' ? level : initial };
  });

  const segments = motionSegments(trace.events, parts);
  const instants = clusterInstants(
    segments.flatMap((s) => (s.endS === null ? [s.startS] : [s.startS, s.endS])),
    sameInstantS,
  );
  // An instant's events lie within it, so the first instant reaching t holds t.
  const instantOf = (t: number) => firstReaching(instants, t - 1e-12, (c) => c.to);
  const open = segments.some((s) => s.endS === null);
  const bounds = [startS, ...instants.map((c) => c.from), ...(open ? [endS] : [])];
  const stepCount = Math.max(1, bounds.length - 1);

  // Where each actuator stands when a motion starts: the end of its previous motion, else its start position.
  const standing: Array<{ at: EndPosition; level: number }> = actuators.map((a) => ({ at: a.initial, level: a.initialLevel }));
  const moving: SegmentSpan[][] = Array.from({ length: stepCount }, () => []);
  const starting: Segment[][] = instants.map(() => []);
  const arriving: Segment[][] = instants.map(() => []);
  for (const s of segments) {
    const from = standing[s.actuator]!;
    const first = instantOf(s.startS) + 1;
    const last = s.endS === null ? instants.length : instantOf(s.endS);
    starting[first - 1]!.push(s);
    if (s.endS !== null) {
      arriving[last]!.push(s);
      standing[s.actuator] = { at: s.end, level: s.end === 'mid' ? levelAt[s.actuator]!(s.endS) : s.end };
    }
    for (let k = first; k <= last; k += 1) moving[k]!.push({ segment: s, first, last, from });
  }

  const conditions = trace.events
    .map((e) => ({ t: e.t, text: conditionText(e), componentId: e.componentId }))
    .filter((c): c is { t: number; text: string; componentId: string } => c.text !== null)
    .sort((a, b) => a.t - b.t);

  const steps: SequenceStep[] = [];
  for (let k = 0; k < stepCount; k += 1) {
    const stepStart = bounds[k]!;
    const stepEnd = bounds[k + 1] ?? endS;
    const motions = moving[k]!
      .sort((a, b) => a.segment.actuator - b.segment.actuator)
      .map(({ segment: s, first, last, from: standingAt }): SequenceMotion => {
        const level = levelAt[s.actuator]!;
        const atEnd = k === last && s.endS !== null;
        const from = k === first ? standingAt.at : 'mid';
        const to = atEnd ? s.end : 'mid';
        return {
          componentId: s.componentId,
          tag: s.tag,
          direction: s.direction,
          from,
          to,
          fromLevel: k === first ? standingAt.level : level(stepStart),
          toLevel: to === 'mid' ? level(atEnd ? s.endS! : stepEnd) : to,
        };
      });
    const { trigger, cause } = k === 0 ? NO_TRIGGER : triggerOf(k - 1);
    steps.push({ index: k, startS: stepStart, endS: stepEnd, motions, trigger, cause });
  }
  return { actuators, steps };

  function triggerOf(instant: number): Pick<SequenceStep, 'trigger' | 'cause'> {
    if (!starting[instant]!.length) return arrivalTrigger(arriving[instant]!);
    const after = instant === 0 ? -Infinity : instants[instant - 1]!.to;
    const upTo = instants[instant]!.to;
    // The last condition at or before the instant's end.
    let i = firstReaching(conditions, upTo + 2e-12, (c) => c.t);
    if (i >= conditions.length || conditions[i]!.t >= upTo + 2e-12) i -= 1;
    if (i >= 0 && conditions[i]!.t > after + 1e-12) {
      const last = conditions[i]!;
      const texts: string[] = [];
      for (; i >= 0 && conditions[i]!.t >= last.t - sameInstantS && conditions[i]!.t > after + 1e-12; i -= 1) texts.unshift(conditions[i]!.text);
      return { trigger: [...new Set(texts)].join(' and '), cause: { componentId: last.componentId, tag: byId.get(last.componentId)!.tag } };
    }
    return instant === 0 ? NO_TRIGGER : arrivalTrigger(arriving[instant - 1]!);
  }

  function arrivalTrigger(arrivals: readonly Segment[]): Pick<SequenceStep, 'trigger' | 'cause'> {
    const last = arrivals[arrivals.length - 1];
    return last ? { trigger: arrivals.map(arrivalText).join(' and '), cause: { componentId: last.componentId, tag: last.tag } } : NO_TRIGGER;
  }


  function conditionText(e: TraceEvent): string | null {
    const component = byId.get(e.componentId);
    if (!component) return null;
    const tag = component.tag;
    const type = componentTypeById(component.type);
    if (e.kind.startsWith('input-')) {
      const action = e.kind.slice('input-'.length);
      if (action === 'ignored') return null;
      const words: Record<string, string> = { press: 'pressed', release: 'released', toggle: 'toggled', set: 'set' };
      return `${tag} ${words[action] ?? action}`;
    }
    if (!type) return null;
    // Sensors and pressure switches: their contact edge is the condition a controller would read.
    if (type.category === 'measurement' || type.id.startsWith('proximity-sensor') || type.id === 'limit-switch' || type.id === 'pressure-switch') {
      if (e.kind === 'actuated' || e.kind === 'operated') return `${tag} on`;
      if (e.kind === 'released') return `${tag} off`;
    }
    if ((type.id === 'timer-relay-on-delay' && e.kind === 'contacts-operated') || (type.id === 'timer-relay-off-delay' && e.kind === 'contacts-returned')) {
      return `${tag} time elapsed`;
    }
    // A roller valve is a sensor of the air side: actuated leaves its rest position (index 1).
    const actuation = component.parameters['actuation'];
    if (e.kind === 'switched' && (actuation === 'roller' || actuation === 'one-way-roller') && type.states.length > 1) {
      return `${tag} ${e.detail === type.states[1] ? 'released' : 'actuated'}`;
    }
    return null;
  }
}

function arrivalText(s: Segment): string {
  if (s.end === 'mid') return `${s.tag} stopped between its ends`;
  return `${s.tag} reached its end (${s.end === 1 ? 'extended' : 'retracted'})`;
}

/** The stroke (or swivel angle) of an actuator, in the unit of its `:x` signal. */
function strokeOf(component: CircuitDocument['components'][number]): number {
  const type = componentTypeById(component.type)!;
  const name = 'stroke' in type.parameters ? 'stroke' : 'swivelAngle';
  const value = component.parameters[name] ?? type.parameters[name]?.default;
  return typeof value === 'number' && value > 0 ? value : 1;
}

/** Position as a fraction of the stroke at time t, linear between samples; 0 when the trace has no position signal. */
function levelReader(trace: Trace, componentId: string, stroke: number): (t: number) => number {
  const x = trace.signals.find((s) => s.name === `${componentId}:x`)?.values;
  const time = trace.time;
  return (t) => {
    if (!x || !time.length) return 0;
    const hi = firstReaching(time, t, (ti) => ti);
    const lo = Math.max(0, hi - 1);
    const span = time[hi]! - time[lo]!;
    const w = span > 0 ? Math.min(1, Math.max(0, (t - time[lo]!) / span)) : 1;
    const value = x[lo]! + (x[hi]! - x[lo]!) * w;
    return Math.min(1, Math.max(0, value / stroke));
  };
}

function endOf(level: number): EndPosition {
  if (level <= END_BAND) return 0;
  if (level >= 1 - END_BAND) return 1;
  return 'mid';
}

/** Each actuator's motions from its `started` event to the `end-position` or `stopped` that ends it. */
function motionSegments(events: readonly TraceEvent[], parts: ReadonlyArray<{ id: string; tag: string }>): Segment[] {
  const ids = parts.map((c) => c.id);
  const segments: Segment[] = [];
  const moving = new Map<number, Segment>();
  for (const e of [...events].sort((a, b) => a.t - b.t)) {
    const actuator = ids.indexOf(e.componentId);
    if (actuator < 0) continue;
    if (e.kind === 'started') {
      const running = moving.get(actuator);
      if (running) running.endS = e.t;
      const segment: Segment = { actuator, componentId: e.componentId, tag: parts[actuator]!.tag, direction: e.detail === 'retracting' ? 'in' : 'out', startS: e.t, endS: null, end: 'mid' };
      segments.push(segment);
      moving.set(actuator, segment);
    } else if (e.kind === 'end-position' || e.kind === 'stopped') {
      const running = moving.get(actuator);
      if (!running) continue;
      running.endS = e.t;
      running.end = e.kind === 'stopped' ? 'mid' : e.detail === 'extended' ? 1 : 0;
      moving.delete(actuator);
    }
  }
  return segments;
}

/** Groups sorted instants into runs whose neighbours lie within `within` of each other. */
function clusterInstants(times: number[], within: number): Array<{ from: number; to: number }> {
  const sorted = [...times].sort((a, b) => a - b);
  const out: Array<{ from: number; to: number }> = [];
  for (const t of sorted) {
    const last = out[out.length - 1];
    if (last && t - last.to <= within) last.to = t;
    else out.push({ from: t, to: t });
  }
  return out;
}

/** Index of the first item whose key is at least t, in items sorted by key; the last index when none is. */
function firstReaching<T>(items: readonly T[], t: number, key: (item: T) => number): number {
  let lo = 0;
  let hi = items.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (key(items[mid]!) < t) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
