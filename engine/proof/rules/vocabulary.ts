import type { CircuitComponent, CircuitDocument } from '../../document/schema';
import { componentTypeById } from '../../components/registry';
import { parameterDefaults, type ComponentType } from '../../components/types';
import type { BoundAtom } from './ast';

/**
 * What the rule language can say about each component type: the state words valid after `is`,
 * the measures (position, speed, angle) and the air ports for `pressure at`, each turned into a
 * test on one trace signal.
 */

/** A cylinder counts as retracted or extended within this distance of its end stop, m (common practice: end-position sensors switch within about half a millimetre). */
export const END_TOLERANCE_M = 0.0005;
/** A cylinder counts as moving above this speed, m/s (common practice: slower is creep, not a stroke). */
export const MOVING_SPEED_M_PER_S = 0.001;
/** A semi-rotary actuator is at an end within this angle, rad (0.5°, common practice). */
export const END_TOLERANCE_RAD = (0.5 * Math.PI) / 180;
/** A semi-rotary actuator counts as turning above this rate, rad/s (1 °/s, common practice). */
export const TURNING_RATE_RAD_PER_S = Math.PI / 180;
/** `=` on a pressure holds within this much, Pa (0.05 bar, common practice for a gauge reading). */
export const PRESSURE_TOLERANCE_PA = 5_000;

export type ComponentClass = 'cylinder' | 'rotary' | 'valve' | 'button' | 'estop' | 'switch' | 'coil' | 'lamp' | 'contact' | 'counter' | 'quick-exhaust' | 'other';

type Test = Omit<BoundAtom, 'signal' | 'constant'> & { quantity: string };

const flag = (quantity: string, on: boolean): Test => ({ quantity, magnitude: false, cmp: '=', threshold: on ? 1 : 0, tolerance: 0.5 });

const COIL_TYPES = new Set(['relay-coil', 'timer-relay-on-delay', 'timer-relay-off-delay']);
const SWITCH_TYPES = new Set(['limit-switch', 'proximity-sensor-reed', 'proximity-sensor-inductive']);

export function componentClass(type: ComponentType): ComponentClass {
  if (type.id === 'cylinder-single-acting' || type.id === 'cylinder-double-acting') return 'cylinder';
  if (type.id === 'semi-rotary-actuator') return 'rotary';
  if (type.positions) return 'valve';
  if (type.id === 'pushbutton-no' || type.id === 'pushbutton-nc' || type.id === 'selector-switch') return 'button';
  if (type.id === 'emergency-stop') return 'estop';
  if (SWITCH_TYPES.has(type.id) || type.id === 'pressure-switch') return 'switch';
  if (COIL_TYPES.has(type.id) || type.id === 'solenoid-coil') return 'coil';
  if (type.id === 'indicator-lamp') return 'lamp';
  if (type.id === 'relay-contact-no' || type.id === 'relay-contact-nc') return 'contact';
  if (type.id === 'counter') return 'counter';
  if (type.id === 'quick-exhaust-valve') return 'quick-exhaust';
  return 'other';
}

export function parametersOf(component: CircuitComponent, type: ComponentType): Record<string, number | string | boolean> {
  return { ...parameterDefaults(type), ...component.parameters };
}

/** True for a valve a hand works on side a (push-button, mushroom, detented lever or selector). */
export function isHandValve(component: CircuitComponent, type: ComponentType): boolean {
  if (!type.positions || !type.handOperation) return false;
  return type.handOperation(parametersOf(component, type)) !== null;
}

/** The state words valid after `is` for a component, each with its test, in the order the vocabulary lists them. */
export function stateWords(component: CircuitComponent, type: ComponentType): Map<string, Test> {
  const words = new Map<string, Test>();
  const p = parametersOf(component, type);
  switch (componentClass(type)) {
    case 'cylinder': {
      const stroke = Number(p.stroke);
      words.set('retracted', { quantity: 'x', magnitude: false, cmp: '<=', threshold: END_TOLERANCE_M, tolerance: 0 });
      words.set('extended', { quantity: 'x', magnitude: false, cmp: '>=', threshold: stroke - END_TOLERANCE_M, tolerance: 0 });
      words.set('extending', { quantity: 'v', magnitude: false, cmp: '>', threshold: MOVING_SPEED_M_PER_S, tolerance: 0 });
      words.set('retracting', { quantity: 'v', magnitude: false, cmp: '<', threshold: -MOVING_SPEED_M_PER_S, tolerance: 0 });
      words.set('moving', { quantity: 'v', magnitude: true, cmp: '>', threshold: MOVING_SPEED_M_PER_S, tolerance: 0 });
      words.set('still', { quantity: 'v', magnitude: true, cmp: '<=', threshold: MOVING_SPEED_M_PER_S, tolerance: 0 });
      break;
    }
    case 'rotary': {
      const swivel = Number(p.swivelAngle);
      words.set('at start', { quantity: 'x', magnitude: false, cmp: '<=', threshold: END_TOLERANCE_RAD, tolerance: 0 });
      words.set('at end', { quantity: 'x', magnitude: false, cmp: '>=', threshold: swivel - END_TOLERANCE_RAD, tolerance: 0 });
      words.set('turning out', { quantity: 'v', magnitude: false, cmp: '>', threshold: TURNING_RATE_RAD_PER_S, tolerance: 0 });
      words.set('turning back', { quantity: 'v', magnitude: false, cmp: '<', threshold: -TURNING_RATE_RAD_PER_S, tolerance: 0 });
      words.set('turning', { quantity: 'v', magnitude: true, cmp: '>', threshold: TURNING_RATE_RAD_PER_S, tolerance: 0 });
      words.set('still', { quantity: 'v', magnitude: true, cmp: '<=', threshold: TURNING_RATE_RAD_PER_S, tolerance: 0 });
      break;
    }
    case 'valve': {
      // The trace's `position` is the index into `states`; index 1 is the rest position (b, or the centre).
      type.states.forEach((name, index) => words.set(name, { quantity: 'position', magnitude: false, cmp: '=', threshold: index, tolerance: 0.5 }));
      words.set('switched', { quantity: 'position', magnitude: false, cmp: '!=', threshold: 1, tolerance: 0.5 });
      if (isHandValve(component, type)) {
        words.set('pressed', { quantity: 'position', magnitude: false, cmp: '=', threshold: 0, tolerance: 0.5 });
        words.set('released', { quantity: 'position', magnitude: false, cmp: '!=', threshold: 0, tolerance: 0.5 });
      }
      break;
    }
    case 'button':
      words.set('pressed', flag('operated', true));
      words.set('released', flag('operated', false));
      break;
    case 'estop':
      words.set('struck', flag('operated', true));
      words.set('ready', flag('operated', false));
      break;
    case 'switch': {
      const quantity = type.id === 'pressure-switch' ? 'operated' : 'actuated';
      words.set('on', flag(quantity, true));
      words.set('off', flag(quantity, false));
      words.set(quantity, flag(quantity, true));
      words.set('released', flag(quantity, false));
      break;
    }
    case 'coil':
      words.set('on', flag('energised', true));
      words.set('off', flag('energised', false));
      words.set('energised', flag('energised', true));
      words.set('de-energised', flag('energised', false));
      // A relay's contacts follow its coil after the pick-up or drop-out time.
      if (type.id !== 'solenoid-coil') {
        words.set('operated', flag('operated', true));
        words.set('released', flag('operated', false));
      }
      break;
    case 'lamp':
      words.set('on', flag('lit', true));
      words.set('off', flag('lit', false));
      words.set('lit', flag('lit', true));
      words.set('dark', flag('lit', false));
      break;
    case 'contact':
      words.set('closed', flag('closed', true));
      words.set('open', flag('closed', false));
      break;
    case 'counter':
      words.set('reached', flag('reached', true));
      words.set('counting', flag('reached', false));
      break;
    case 'quick-exhaust':
      words.set('exhausting', flag('exhausting', true));
      words.set('filling', flag('exhausting', false));
      break;
    case 'other':
      break;
  }
  return words;
}

/** The ports `pressure at` may name: every air port (electrical terminals have no pressure). */
export function airPorts(type: ComponentType): string[] {
  return type.ports.filter((port) => port.role !== 'terminal').map((port) => port.id);
}

export interface VocabularyEntry {
  tag: string;
  /** Component type id. */
  type: string;
  /** The component's own label, or its type's. */
  label: string;
  /** State words valid after `is`. */
  words: string[];
  /** Ports valid after `pressure at <tag>.` */
  ports: string[];
}

/** What tag completion offers: every component the rule language can say something about, in drawing order. */
export function ruleVocabulary(document: CircuitDocument): VocabularyEntry[] {
  const entries: VocabularyEntry[] = [];
  for (const component of document.components) {
    const type = componentTypeById(component.type);
    if (!type) continue;
    const words = [...stateWords(component, type).keys()];
    const ports = airPorts(type);
    if (words.length === 0 && ports.length === 0) continue;
    entries.push({ tag: component.tag, type: type.id, label: component.label || type.label, words, ports });
  }
  return entries;
}
