import { expect } from 'vitest';
import type { CircuitDocument } from '@/engine/document/schema';
import { compile } from '@/engine/solver/compile';
import { simulate, type InputEvent } from '@/engine/solver/simulate';
import { signal, type Trace, type TraceEvent } from '@/engine/trace/trace';
import { TestCircuit } from '../support/circuit';

/**
 * Helpers for the per-component tests: build a small circuit around one
 * component, run it, and read values and events back at given times.
 * Pressures handed back to tests are in bar gauge; times in s; positions in m.
 */

export const AMBIENT_PA = 101_325;
export const PA_PER_BAR = 100_000;
export const INTERVAL_S = 0.01;

export type Input = InputEvent;

/** Gauge pressure in Pa for a number of bar (supply and set-point parameters are gauge Pa). */
export const bar = (b: number): number => b * PA_PER_BAR;

/** Compiles and simulates; a failed compile throws with the diagnostics so the test says why. */
export function runCircuit(doc: CircuitDocument, inputs: readonly Input[] = [], untilS = 1, intervalS = INTERVAL_S): Trace {
  const { model, diagnostics } = compile(doc);
  if (!model) {
    const text = diagnostics.map((d) => `${d.severity} ${d.code}: ${d.message}`).join('\n');
    throw new Error(`circuit did not compile:\n${text}`);
  }
  return simulate(model, inputs, { untilS, intervalS });
}

function values(trace: Trace, name: string): number[] {
  const s = signal(trace, name);
  if (!s) throw new Error(`no signal "${name}" in trace (have: ${trace.signals.map((x) => x.name).join(', ')})`);
  return s.values;
}

/** Index of the last sample taken at or before t. */
function sampleIndex(trace: Trace, t: number): number {
  if (t < 0 || t > trace.time[trace.time.length - 1]! + 1e-9) throw new Error(`time ${t} s is outside the trace`);
  let i = Math.min(Math.round(t / trace.intervalS), trace.time.length - 1);
  while (i > 0 && trace.time[i]! > t + 1e-9) i -= 1;
  return i;
}

/** Raw value of a signal at the sample at (or just before) time t, in its own unit. */
export function valueAt(trace: Trace, name: string, t: number): number {
  return values(trace, name)[sampleIndex(trace, t)]!;
}

/** Pressure signal at time t, bar gauge. */
export function pressureAt(trace: Trace, name: string, t: number): number {
  return (valueAt(trace, name, t) - AMBIENT_PA) / PA_PER_BAR;
}

/** Pressure, bar gauge, of port `port` of component `id` at time t. */
export function portBar(trace: Trace, id: string, port: string, t: number): number {
  return pressureAt(trace, `${id}:p:${port}`, t);
}

/** Largest and smallest value of a signal over [from, to]. */
export function rangeOver(trace: Trace, name: string, from: number, to: number): { min: number; max: number } {
  const v = values(trace, name);
  const a = sampleIndex(trace, from);
  const b = sampleIndex(trace, to);
  let min = Infinity;
  let max = -Infinity;
  for (let i = a; i <= b; i += 1) {
    min = Math.min(min, v[i]!);
    max = Math.max(max, v[i]!);
  }
  return { min, max };
}

/**
 * First time after `after` at which the signal passes `level` going the given way,
 * linearly interpolated between samples; undefined when it never does.
 */
export function crossingTime(trace: Trace, name: string, level: number, direction: 'rising' | 'falling' = 'rising', after = 0): number | undefined {
  const v = values(trace, name);
  const t = trace.time;
  for (let i = 1; i < v.length; i += 1) {
    if (t[i]! <= after) continue;
    const a = v[i - 1]!;
    const b = v[i]!;
    const passes = direction === 'rising' ? a < level && b >= level : a > level && b <= level;
    if (passes) return t[i - 1]! + ((level - a) / (b - a)) * (t[i]! - t[i - 1]!);
  }
  return undefined;
}

/** Events of one component (and kind, and detail when given), in time order. */
export function eventsOf(trace: Trace, componentId: string, kind?: string, detail?: string): TraceEvent[] {
  return trace.events.filter((e) => e.componentId === componentId && (kind === undefined || e.kind === kind) && (detail === undefined || e.detail === detail));
}

export function lastEvent(trace: Trace, componentId: string, kind: string, detail?: string): TraceEvent | undefined {
  const list = eventsOf(trace, componentId, kind, detail);
  return list[list.length - 1];
}

/** First matching event at or after time `after`. */
export function firstEventAfter(trace: Trace, componentId: string, kind: string, after: number, detail?: string): TraceEvent | undefined {
  return eventsOf(trace, componentId, kind, detail).find((e) => e.t >= after);
}

/** Time of the first matching event at or after `after`; throws when there is none, so a test fails with a clear message. */
export function eventTime(trace: Trace, componentId: string, kind: string, after: number, detail?: string): number {
  const e = firstEventAfter(trace, componentId, kind, after, detail);
  if (!e) {
    const seen = eventsOf(trace, componentId)
      .map((x) => `${x.t.toFixed(4)} ${x.kind} ${x.detail ?? ''}`)
      .join('; ');
    throw new Error(`no ${kind}${detail ? ` (${detail})` : ''} event from ${componentId} after ${after} s; its events: ${seen || 'none'}`);
  }
  return e.t;
}

/** Time from an input at `inputT` to the cylinder reaching the given end. */
export function strokeTime(trace: Trace, cylinderId: string, end: 'extended' | 'retracted', inputT: number): number {
  return eventTime(trace, cylinderId, 'end-position', inputT, end) - inputT;
}

// ---- small circuits -----------------------------------------------------------------

/** A circuit with one air supply `sup` at the given gauge pressure, bar. */
export function withSupply(barGauge = 6, id = 'sup'): TestCircuit {
  return new TestCircuit().add(id, 'air-supply', { pressure: bar(barGauge) });
}

/** Adds a pressure gauge `id` and a tube from `port` to it (a dead end to read a line by). */
export function probe(c: TestCircuit, id: string, port: string): TestCircuit {
  return c.add(id, 'pressure-gauge').tube(port, `${id}:1`);
}

/** Adds a 3/2 NC pushbutton valve `id` fed from `supplyPort`; its output is `id:2`. */
export function pushbutton(c: TestCircuit, id: string, supplyPort: string): TestCircuit {
  return c.add(id, 'valve-3-2-nc').tube(supplyPort, `${id}:1`);
}

/** Press at t, release at t + hold. */
export function pressFor(component: string, t: number, hold: number, parameter?: string): Input[] {
  const p = parameter ? { parameter } : {};
  return [
    { t, component, action: 'press', ...p },
    { t: t + hold, component, action: 'release', ...p },
  ];
}

/**
 * A double-acting cylinder `cyl` driven by a 5/2 pushbutton valve `v` from a 6 bar
 * supply: rest feeds B (retracted), pressed feeds A (extends). `lineA` / `lineB`
 * may put something in a working line: they receive the valve and cylinder ports
 * to join and must tube them together.
 */
export function cylinderRig(options: {
  valve?: Record<string, number | string | boolean>;
  cylinder?: Record<string, number | string | boolean>;
  lineA?: (c: TestCircuit, valvePort: string, cylinderPort: string) => TestCircuit;
  lineB?: (c: TestCircuit, valvePort: string, cylinderPort: string) => TestCircuit;
} = {}): TestCircuit {
  const direct = (c: TestCircuit, a: string, b: string) => c.tube(a, b);
  let c = withSupply(6).add('v', 'valve-5-2', options.valve ?? {}).add('cyl', 'cylinder-double-acting', options.cylinder ?? {}).tube('sup:2', 'v:1');
  c = (options.lineA ?? direct)(c, 'v:4', 'cyl:A');
  c = (options.lineB ?? direct)(c, 'v:2', 'cyl:B');
  return c;
}

/** A meter-out line: the valve port through one-way flow control `id` (free flow 1→2) to the cylinder port. */
export const meterOut =
  (id: string, opening: number) =>
  (c: TestCircuit, valvePort: string, cylinderPort: string): TestCircuit =>
    c.add(id, 'one-way-flow-control', { opening }).tube(valvePort, `${id}:1`).tube(`${id}:2`, cylinderPort);

/** Adds indicator lamp `id` from `terminal` to the control supply's 0 V (`ps:M`): lit while `terminal` is live. */
export function lamp(c: TestCircuit, id: string, terminal: string): TestCircuit {
  return c.add(id, 'indicator-lamp').wire(terminal, `${id}:X1`).wire(`${id}:X2`, 'ps:M');
}

// ---- directional valve port tables ------------------------------------------------------

/** What a working port should read in a position: full supply pressure, or ambient. */
export type PortState = 'supply' | 'ambient';

export interface ValveStep {
  /** What happens at the start of the step; `component` defaults to the valve. */
  actions: Array<Omit<Input, 't' | 'component'> & { component?: string }>;
  /** Expected position index at the end of the step. */
  position: number;
  /** Expected state of each working port at the end of the step. */
  ports: Record<string, PortState>;
}

export const VALVE_STEP_S = 0.5;
const SUPPLY_BAR = 6;

/**
 * Feeds a valve `v` from a 6 bar supply `sup`, puts a short dead-end line with a
 * gauge on each working port, runs the steps one after another (each VALVE_STEP_S
 * long, actions at its start) and reads the position and port pressures just
 * before each step ends.
 */
export function runValveSteps(
  typeId: string,
  parameters: Record<string, number | string | boolean>,
  workingPorts: readonly string[],
  steps: readonly ValveStep[],
  extend: (c: TestCircuit) => TestCircuit = (c) => c,
) {
  let c = withSupply(SUPPLY_BAR).add('v', typeId, parameters).tube('sup:2', 'v:1');
  for (const port of workingPorts) c = probe(c, `g${port}`, `v:${port}`);
  c = extend(c);
  const inputs: Input[] = steps.flatMap((step, k) => step.actions.map(({ component, ...rest }) => ({ t: k * VALVE_STEP_S + 0.05, component: component ?? 'v', ...rest })));
  const trace = runCircuit(c.build(), inputs, steps.length * VALVE_STEP_S);
  return steps.map((_, k) => {
    const t = (k + 1) * VALVE_STEP_S - 0.05;
    return {
      position: valueAt(trace, 'v:position', t),
      ports: Object.fromEntries(workingPorts.map((p) => [p, portBar(trace, 'v', p, t)])),
    };
  });
}

/** Converts the table's expectation into the pressure it should read, bar gauge. */
export const expectedBar = (state: PortState): number => (state === 'supply' ? SUPPLY_BAR : 0);

/**
 * Runs the steps and checks every position and port (within 0.05 bar), naming the step and port that differ.
 * `extend` may add more to the circuit (pilot valves, say) after the valve and its gauges.
 */
export function expectValveSteps(
  typeId: string,
  parameters: Record<string, number | string | boolean>,
  workingPorts: readonly string[],
  steps: readonly ValveStep[],
  extend?: (c: TestCircuit) => TestCircuit,
): void {
  const seen = runValveSteps(typeId, parameters, workingPorts, steps, extend);
  steps.forEach((step, k) => {
    expect(seen[k]!.position, `${typeId} step ${k}: position`).toBe(step.position);
    for (const port of workingPorts) {
      const want = step.ports[port];
      if (!want) throw new Error(`step ${k} has no expectation for port ${port}`);
      expect(Math.abs(seen[k]!.ports[port]! - expectedBar(want)), `${typeId} step ${k}: port ${port} should be at ${want} (reads ${seen[k]!.ports[port]!.toFixed(3)} bar)`).toBeLessThan(0.05);
    }
  });
}

/** Computes a value the first time it is asked for (one simulation shared by several tests, run inside the first). */
export function lazy<T>(fn: () => T): () => T {
  let done = false;
  let value: T;
  return () => {
    if (!done) {
      value = fn();
      done = true;
    }
    return value;
  };
}

/**
 * A logic valve `lv` of the given type with input 1.1 fed through pushbutton valve `p1`
 * from supply `s1`, input 1.2 through `p2` from `s2`, and output 2 on gauge `g`.
 */
export function logicValveTrace(typeId: string, supplyBar: readonly [number, number], inputs: readonly Input[], untilS: number): Trace {
  let c = new TestCircuit()
    .add('s1', 'air-supply', { pressure: bar(supplyBar[0]) })
    .add('s2', 'air-supply', { pressure: bar(supplyBar[1]) })
    .add('lv', typeId);
  c = pushbutton(pushbutton(c, 'p1', 's1:2'), 'p2', 's2:2').tube('p1:2', 'lv:1.1').tube('p2:2', 'lv:1.2');
  c = probe(c, 'g', 'lv:2');
  return runCircuit(c.build(), inputs, untilS);
}

/** Presses the chosen pushbuttons of `logicValveTrace` at 0.05 s and reads the output (bar gauge) at `readAt`. */
export function logicValveOutput(typeId: string, supplyBar: readonly [number, number], supplied: readonly [boolean, boolean], readAt = 0.8): number {
  const inputs: Input[] = (['p1', 'p2'] as const).flatMap((id, i) => (supplied[i] ? [{ t: 0.05, component: id, action: 'press' as const }] : []));
  return portBar(logicValveTrace(typeId, supplyBar, inputs, readAt + 0.05), 'lv', '2', readAt);
}

/** The four combinations of two inputs, as [input 1.1 supplied, input 1.2 supplied]. */
export const BOTH_INPUT_COMBINATIONS: ReadonlyArray<readonly [boolean, boolean]> = [
  [false, false],
  [true, false],
  [false, true],
  [true, true],
];

/**
 * Timer `td` of the given type fed from a 6 bar supply, output on a gauge; control air
 * on 12 from pushbutton `pb`, pressed at 0.1 s and released at `releaseAt` if given.
 */
export function timerRun(typeId: string, throttleC: number, releaseAt?: number) {
  const doc = withSupply(6)
    .add('pb', 'valve-3-2-nc')
    .add('td', typeId, { throttleConductance: throttleC })
    .add('g', 'pressure-gauge')
    .tube('sup:2', 'pb:1')
    .tube('pb:2', 'td:12')
    .tube('sup:2', 'td:1')
    .tube('td:2', 'g:1')
    .build();
  const inputs = [{ t: 0.1, component: 'pb', action: 'press' as const }, ...(releaseAt === undefined ? [] : [{ t: releaseAt, component: 'pb', action: 'release' as const }])];
  return runCircuit(doc, inputs, 2.5);
}
