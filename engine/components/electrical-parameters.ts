import type { InputCommand, ParameterSpec, PortSpec, RuntimeApi } from './types';

/**
 * Parameter specs and terminal sets shared by the electrical component types.
 * Terminal names follow the usual marking of control devices: coils A1/A2,
 * normally-open contacts 13/14, normally-closed 11/12 (21/22 on a relay's second
 * contact), changeover 11 (common) / 12 / 14, lamps X1/X2, diodes A/K, and the
 * brown/black/blue (BN/BK/BU) leads of a three-wire sensor (common practice).
 */
export const terminals = (...ids: string[]): PortSpec[] => ids.map((id) => ({ id, role: 'terminal' as const }));

export const coilTagParam: ParameterSpec = {
  kind: 'tag',
  refers: 'coil',
  label: 'Operated by',
  default: 'K1',
  description: 'Tag of the relay, timer relay or counter whose coil switches this contact.',
};

const delayParam = (label: string, defaultS: number, description: string): ParameterSpec => ({ kind: 'number', quantity: 'time', label, default: defaultS, min: 0, max: 600, description });

export const pickUpParam = (defaultS: number, label = 'Pick-up time'): ParameterSpec =>
  delayParam(label, defaultS, 'Delay from the coil being energised to its contacts switching.');

export const dropOutParam = (defaultS: number, label = 'Drop-out time'): ParameterSpec =>
  delayParam(label, defaultS, 'Delay from the coil losing power to its contacts returning.');

/**
 * A load's new state from the control network's `set` input (value 1 energised, 0 not);
 * null when the input is something else or changes nothing.
 */
export function switchedLoad(command: InputCommand, energised: boolean): boolean | null {
  if (command.action !== 'set') return null;
  const now = (command.value ?? 0) > 0;
  return now === energised ? null : now;
}

/** Half-length of the stretch of stroke over which a position switch or sensor is actuated, and its release margin. */
export const windowParam = (defaultM: number): ParameterSpec => ({
  kind: 'number',
  quantity: 'length',
  label: 'Switching window (each side)',
  default: defaultM,
  min: 0.0001,
  max: 0.1,
  description: 'The switch is actuated while the piston is within this distance of its set position.',
});

export const hysteresisParam = (defaultM: number): ParameterSpec => ({
  kind: 'number',
  quantity: 'length',
  label: 'Hysteresis',
  default: defaultM,
  min: 0,
  max: 0.05,
  description: 'How much further the piston must move away before an actuated switch releases.',
});

/** A sensor's failure state: stuck on (reads actuated), stuck off, or null while it works. */
export type StuckState = boolean | null;

/**
 * A sensor failure given as an input, `set` `stuck` with value 1 (stuck on), 0 (stuck off)
 * or -1 (working again): the new state, announced as an event; undefined for any other input.
 */
export function stuckInput(command: InputCommand, api: RuntimeApi): StuckState | undefined {
  if (command.action !== 'set' || command.parameter !== 'stuck' || command.value === undefined) return undefined;
  const state: StuckState = command.value < 0 ? null : command.value > 0;
  api.event(state === null ? 'working' : state ? 'stuck-on' : 'stuck-off');
  return state;
}
