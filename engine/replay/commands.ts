import { componentTypeById } from '../components/registry';
import type { HandOperation } from '../components/types';
import type { CircuitDocument } from '../document/schema';
import { componentClass, isHandValve, parametersOf } from '../proof/rules/vocabulary';
import type { InputEvent } from '../solver/simulate';
import { ReplayError } from './errors';
import type { RecordedLog, RecordedSignal } from './types';

/** Words that say a command is active when the recorded value is 1, and those that say it is at rest. */
const ACTIVE_WORDS = new Set(['pressed', 'struck', 'energised', 'on']);
const REST_WORDS = new Set(['released', 'ready', 'de-energised', 'off']);

/** A recorded 0/1 value counts as 1 above this. */
export const STATE_THRESHOLD = 0.5;

/**
 * Turns every command signal of a log into timed inputs: a hand-worked part (push-button,
 * selector, emergency stop, hand valve) is pressed and released, toggled (latching selector,
 * detented lever) or struck and reset, as a person would; a solenoid coil gets `set` 1/0, as
 * its control circuit would give it. Before the log every command is taken to be at rest, so a
 * command active at the first sample acts at that time. Throws a ReplayError naming the tag and
 * word for anything else.
 */
export function commandsToInputs(log: RecordedLog, document: CircuitDocument): InputEvent[] {
  const inputs: InputEvent[] = [];
  for (const signal of log.signals) {
    if (signal.role !== 'command') continue;
    const drive = driverFor(signal, document);
    for (const edge of activeEdges(signal, drive.activeWhenOne)) inputs.push(...drive.inputsAt(edge.t, edge.active).map((command) => ({ ...command, component: signal.tag })));
  }
  // Stable: simultaneous inputs keep the order of the log's columns.
  return inputs.map((input, order) => ({ input, order })).sort((a, b) => a.input.t - b.input.t || a.order - b.order).map(({ input }) => input);
}

type Command = Omit<InputEvent, 'component'>;

interface Driver {
  activeWhenOne: boolean;
  inputsAt(t: number, active: boolean): Command[];
}

function driverFor(signal: RecordedSignal, document: CircuitDocument): Driver {
  const where = `command ${signal.tag} '${signal.word}'`;
  if (signal.kind !== 'state') throw new ReplayError(`${where}: a command must be a 0/1 state, not a number`);
  const component = document.components.find((c) => c.tag === signal.tag);
  if (!component) throw new ReplayError(`${where}: the drawing has no component tagged '${signal.tag}'`);
  const type = componentTypeById(component.type);
  if (!type) throw new ReplayError(`${where}: '${signal.tag}' is of type '${component.type}', which this version does not know`);
  const kind = componentClass(type);
  const byHand = kind === 'button' || kind === 'estop' || (kind === 'valve' && isHandValve(component, type));
  const isCoil = type.id === 'solenoid-coil';
  if (!byHand && !isCoil) {
    throw new ReplayError(`${where}: only hand-worked parts (push-buttons, selectors, emergency stops, hand valves) and solenoid coils can be commands; map '${signal.tag}' (${type.label.toLowerCase()}) as an observation`);
  }
  const valid = isCoil ? ['energised', 'de-energised', 'on', 'off'] : kind === 'estop' ? ['struck', 'ready'] : ['pressed', 'released'];
  if (!valid.includes(signal.word)) throw new ReplayError(`${where}: for ${type.label.toLowerCase()} ${signal.tag} the word must be ${valid.join(', ')}`);
  const activeWhenOne = ACTIVE_WORDS.has(signal.word);
  if (!activeWhenOne && !REST_WORDS.has(signal.word)) throw new ReplayError(`${where}: unknown word`);
  if (isCoil) return { activeWhenOne, inputsAt: (t, active) => [{ t, action: 'set', value: active ? 1 : 0 }] };
  const operation: HandOperation = type.handOperation?.(parametersOf(component, type)) ?? 'hold';
  return { activeWhenOne, inputsAt: (t, active) => [{ t, action: handAction(operation, active) }] };
}

function handAction(operation: HandOperation, active: boolean): 'press' | 'release' | 'toggle' {
  if (operation === 'hold') return active ? 'press' : 'release';
  // A latching part changes state on every push; an emergency stop is struck, then reset by a twist or pull.
  if (operation === 'switch') return 'toggle';
  return active ? 'press' : 'toggle';
}

/** The moments a command becomes active or returns to rest, starting from rest before the log. */
function activeEdges(signal: RecordedSignal, activeWhenOne: boolean): Array<{ t: number; active: boolean }> {
  const edges: Array<{ t: number; active: boolean }> = [];
  let active = false;
  signal.values.forEach((value, i) => {
    const now = value > STATE_THRESHOLD === activeWhenOne;
    if (now !== active) edges.push({ t: Math.max(0, signal.times[i]!), active: now });
    active = now;
  });
  return edges;
}
