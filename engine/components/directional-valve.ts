import { conductanceParam, criticalRatioParam, pilotHysteresisParam, pilotThresholdParam, switchTimeParam, withDefault } from './parameters';
import type { Behaviour, BuildContext, ComponentType, HandOperation, InputCommand, NodeRef, ParameterSpec, ParameterValues, PortSpec, RestrictionRef, RuntimeApi } from './types';

/**
 * Shared model of a directional control valve: a spool with two or three
 * positions, each position connecting some port pairs (ISO 1219-1 envelopes).
 * The valve types (2/2, 3/2, 4/2, 5/2, 5/3 …) are one file each and declare
 * only their ports and positions; actuation and return are parameters.
 */

/** One switching position: its name and the port pairs joined in it; every other port is blocked. */
export interface ValvePosition {
  name: string;
  passages: ReadonlyArray<readonly [string, string]>;
}

export interface ValveDefinition {
  id: string;
  label: string;
  description: string;
  ports: readonly PortSpec[];
  /**
   * Two positions: [actuated ("a", side 14 or 12), normal ("b")].
   * Three positions: [side a, centre, side b].
   */
  positions: readonly ValvePosition[];
  /** Pilot ports of side a and side b, per ISO 5599-3 (14/12 on 5/2, 12/10 on 3/2). */
  pilotPorts: readonly [string, string];
  category?: ComponentType['category'];
  /** Parameter defaults that differ from a plain valve's (a shut-off valve is lever-operated). */
  defaults?: Partial<Record<'actuation' | 'returnBy', string>> & { pilotThreshold?: number };
}

/** Ports of a three-port valve (3/2): supply 1, working 2, exhaust 3, pilots 12 and 10. */
export const THREE_PORTS: readonly PortSpec[] = [
  { id: '1', role: 'supply' },
  { id: '2', role: 'working' },
  { id: '3', role: 'exhaust' },
  { id: '12', role: 'pilot' },
  { id: '10', role: 'pilot' },
];

/** Ports of a five-port valve (5/2, 5/3): supply 1, working 2 and 4, exhausts 3 and 5, pilots 14 and 12. */
export const FIVE_PORTS: readonly PortSpec[] = [
  { id: '1', role: 'supply' },
  { id: '2', role: 'working' },
  { id: '4', role: 'working' },
  { id: '3', role: 'exhaust' },
  { id: '5', role: 'exhaust' },
  { id: '14', role: 'pilot' },
  { id: '12', role: 'pilot' },
];

/** The common positions: 1→2 open, 2→3 exhausting (three ports); side 14 and side 12 of a five-port valve. */
export const OPEN_1_2: ValvePosition = { name: 'open', passages: [['1', '2']] };
export const EXHAUST_2_3: ValvePosition = { name: 'exhausting', passages: [['2', '3']] };
export const FIVE_PORT_SIDE_A: ValvePosition = { name: 'a', passages: [['1', '4'], ['2', '3']] };
export const FIVE_PORT_SIDE_B: ValvePosition = { name: 'b', passages: [['1', '2'], ['4', '5']] };

export const ACTUATIONS = ['pushbutton', 'mushroom', 'lever-detent', 'selector-detent', 'roller', 'one-way-roller', 'pilot', 'solenoid'] as const;
export const RETURNS = ['spring', 'pilot', 'solenoid', 'detent'] as const;
type Actuation = (typeof ACTUATIONS)[number];

/** A lever or selector with a detent stays where it is put, and moves back only when worked again. */
const isDetent = (kind: string | null) => kind === 'lever-detent' || kind === 'selector-detent';

/** Worked by hand on side a: a button is held, a detented lever or selector switched; other actuations are not a hand's. */
function valveHandOperation(parameters: ParameterValues): HandOperation | null {
  const actuation = String(parameters.actuation);
  if (actuation === 'pushbutton' || actuation === 'mushroom') return 'hold';
  return isDetent(actuation) ? 'switch' : null;
}

/** Window around a linked stroke position within which a roller is held down, m (common practice: a few mm of cam travel). */
export const ROLLER_WINDOW_M = 0.002;

const valveParameters: Record<string, ParameterSpec> = {
  actuation: { kind: 'choice', label: 'Actuation', options: ACTUATIONS, default: 'pushbutton' },
  returnBy: { kind: 'choice', label: 'Return', options: RETURNS, default: 'spring' },
  conductance: conductanceParam('Sonic conductance C', 1e-8),
  criticalRatio: criticalRatioParam,
  switchTime: switchTimeParam,
  pilotThreshold: pilotThresholdParam,
  pilotHysteresis: pilotHysteresisParam,
  manualOverride: { kind: 'flag', label: 'Manual override on solenoid', default: true },
  stuck: {
    kind: 'flag',
    label: 'Spool stuck in its rest position',
    default: false,
    description: 'A failure to look into: the spool ignores every actuation and stays where it rests.',
  },
};

/** Builds a component type for a directional control valve from its ports and positions. */
export function defineDirectionalValve(def: ValveDefinition): ComponentType {
  const defaults = { ...(def.positions.length === 3 ? { actuation: 'lever-detent' } : {}), ...def.defaults };
  const parameters: Record<string, ParameterSpec> = { ...valveParameters };
  for (const [name, value] of Object.entries(defaults)) parameters[name] = withDefault(parameters[name]!, value);
  return {
    id: def.id,
    version: 1,
    label: def.label,
    category: def.category ?? 'final-valve',
    description: def.description,
    ports: def.ports,
    parameters,
    states: def.positions.map((p) => p.name),
    positions: def.positions,
    pilotPorts: def.pilotPorts,
    inputs: ['press', 'release', 'toggle', 'set'],
    handOperation: valveHandOperation,
    build: (ctx) => buildValveBehaviour(ctx, def),
  };
}

interface Side {
  /** Manual, latched or energised command. */
  commanded: boolean;
  /** Pilot pressure above threshold (with hysteresis). */
  piloted: boolean;
  /** Held by a cam at a linked stroke position. */
  rolled: boolean;
}

/**
 * The running valve. `pilotNodes` replaces the nodes of the pilot ports when a
 * type pilots its spool from inside (a time-delay valve's reservoir).
 */
export function buildValveBehaviour(ctx: BuildContext, def: ValveDefinition, pilotNodesOverride?: readonly NodeRef[]): Behaviour {
  const actuation = ctx.choice('actuation') as Actuation;
  const returnBy = ctx.choice('returnBy');
  const switchTime = ctx.num('switchTime');
  const threshold = ctx.num('pilotThreshold');
  const hysteresis = ctx.num('pilotHysteresis');
  const manualOverride = ctx.flag('manualOverride');
  const stuck = ctx.flag('stuck');
  const threePosition = def.positions.length === 3;
  // Side b is driven when the return is pilot or solenoid (double-acting valves), and always on 5/3;
  // a detented lever or selector is moved back by the same hand, so it works both sides.
  const detentedHandle = (actuation === 'lever-detent' || actuation === 'selector-detent') && returnBy === 'detent';
  const sideBActuation: Actuation | null = threePosition || detentedHandle ? actuation : returnBy === 'pilot' ? 'pilot' : returnBy === 'solenoid' ? 'solenoid' : null;

  // One restriction per port pair that any position joins.
  const pairs = new Map<string, RestrictionRef>();
  for (const position of def.positions) {
    for (const [from, to] of position.passages) {
      const id = [from, to].sort().join('-');
      if (pairs.has(id)) continue;
      pairs.set(
        id,
        ctx.restriction({
          name: `${from}-${to}`,
          from: ctx.port(from),
          to: ctx.port(to),
          conductance: ctx.num('conductance'),
          criticalRatio: ctx.num('criticalRatio'),
          opening: 0,
        }),
      );
    }
  }
  const pilotNodes = pilotNodesOverride ?? def.pilotPorts.map((p) => ctx.port(p));
  const links = ctx.actuationLinks();
  const sides: [Side, Side] = [
    { commanded: false, piloted: false, rolled: false },
    { commanded: false, piloted: false, rolled: false },
  ];
  // Index 1 is the rest position in both layouts: "b" of two, the centre of three.
  let current = 1;
  let pendingTarget: number | null = null;

  const active = (s: number): boolean => {
    const kind = s === 0 ? actuation : sideBActuation;
    if (!kind) return false;
    const side = sides[s]!;
    if (kind === 'pilot') return side.piloted;
    if (kind === 'roller' || kind === 'one-way-roller') return side.rolled || side.commanded;
    return side.commanded;
  };

  const target = (): number => {
    const a = active(0);
    const b = active(1);
    if (threePosition) {
      if (a && !b) return 0;
      if (b && !a) return 2;
      if (!a && !b) return returnBy === 'detent' ? current : 1;
      return current;
    }
    if (a && !b) return 0;
    if (b && !a) return 1;
    if (a && b) return current;
    return returnBy === 'spring' ? 1 : current;
  };

  // Each position's opening of every passage, worked out once: a valve switches many times a run.
  const openings = def.positions.map((position) => {
    const open = new Set(position.passages.map(([f, t]) => [f, t].sort().join('-')));
    return [...pairs].map(([id, ref]) => [ref, open.has(id) ? 1 : 0] as const);
  });
  const applyPosition = (api: RuntimeApi, index: number) => {
    for (const [ref, opening] of openings[index]!) api.setOpening(ref, opening);
  };

  const reconsider = (api: RuntimeApi) => {
    if (stuck) return;
    const next = target();
    if (next === current) {
      if (pendingTarget !== null) api.cancel('switch');
      pendingTarget = null;
      return;
    }
    if (pendingTarget === next) return;
    api.cancel('switch');
    pendingTarget = next;
    api.schedule(switchTime, 'switch');
  };

  const guardValues = new Array<number>(2 + 2 * links.length).fill(0);

  return {
    start(api) {
      applyPosition(api, current);
      reconsider(api);
    },
    guards(api) {
      for (let s = 0; s < 2; s += 1) {
        const gauge = api.pressure(pilotNodes[s]!) - api.ambientPa();
        guardValues[s] = gauge - (sides[s]!.piloted ? threshold - hysteresis : threshold);
      }
      // A plain loop: guards run at every accepted step, and a callback per call is garbage.
      for (let i = 0; i < links.length; i += 1) {
        const link = links[i]!;
        const x = api.position(link.piston);
        guardValues[2 + 2 * i] = x - (link.positionM - ROLLER_WINDOW_M);
        guardValues[3 + 2 * i] = link.positionM + ROLLER_WINDOW_M - x;
      }
      return guardValues;
    },
    onGuard(index, rising, api) {
      if (index < 2) {
        sides[index]!.piloted = rising;
      } else {
        // Roller cams act on side a.
        const inWindow = links.some((link) => {
          const x = api.position(link.piston);
          return x >= link.positionM - ROLLER_WINDOW_M && x <= link.positionM + ROLLER_WINDOW_M;
        });
        const movingForward = links.some((link) => api.velocity(link.piston) > 0);
        sides[0]!.rolled = actuation === 'one-way-roller' ? inWindow && (sides[0]!.rolled || movingForward) : inWindow;
      }
      reconsider(api);
    },
    onTimer(tag, api) {
      if (tag !== 'switch' || pendingTarget === null) return;
      current = pendingTarget;
      pendingTarget = null;
      applyPosition(api, current);
      api.event('switched', def.positions[current]!.name);
      reconsider(api);
    },
    onInput(command: InputCommand, api) {
      const s = command.parameter === 'b' ? 1 : 0;
      const side = sides[s]!;
      const kind = s === 0 ? actuation : sideBActuation;
      // A solenoid is driven by its coil (`set`); pressing it by hand needs the manual override.
      if (kind === 'solenoid' && command.action !== 'set' && !manualOverride) {
        api.event('input-ignored', 'no manual override');
        return;
      }
      if (command.action === 'set') side.commanded = (command.value ?? 0) > 0;
      else if (command.action === 'toggle' || isDetent(kind)) {
        if (command.action !== 'release') side.commanded = !side.commanded;
      } else side.commanded = command.action === 'press';
      // A detented lever moved to one side leaves the other.
      if (isDetent(kind) && side.commanded) sides[1 - s]!.commanded = false;
      if (stuck) api.event('input-ignored', 'spool stuck');
      reconsider(api);
    },
    signals() {
      return { position: current };
    },
  };
}
