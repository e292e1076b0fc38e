import { componentTypeById } from '../../components/registry';
import { parameterDefaults, type HandOperation, type InputCommand } from '../../components/types';
import type { CircuitComponent, CircuitDocument } from '../../document/schema';
import type { Variation, VariationKind } from './types';

/** Types that take a `set` `stuck` failure input: the position switches and sensors, and the pressure switch. */
const STUCK_TYPES = new Set(['limit-switch', 'proximity-sensor-reed', 'proximity-sensor-inductive', 'pressure-switch']);

const KIND_WORDS: Readonly<Record<VariationKind, string>> = {
  button: 'worked by hand',
  'sensor-stuck-on': 'stuck on',
  'sensor-stuck-off': 'stuck off',
  'supply-loss': 'loses its air',
  'power-loss': 'loses control power',
};

function handOperation(component: CircuitComponent): HandOperation | null {
  const type = componentTypeById(component.type);
  if (!type?.handOperation) return null;
  return type.handOperation({ ...parameterDefaults(type), ...component.parameters });
}

function kindsOf(component: CircuitComponent): VariationKind[] {
  if (handOperation(component)) return ['button'];
  if (STUCK_TYPES.has(component.type)) return ['sensor-stuck-on', 'sensor-stuck-off'];
  if (component.type === 'air-supply') return ['supply-loss'];
  if (component.type === 'dc-supply') return ['power-loss'];
  return [];
}

/** What the drawing offers to vary, in drawing order: each component that can change, with the ways it can. */
export function describeVariations(document: CircuitDocument): Array<{ tag: string; kinds: VariationKind[]; label: string }> {
  return document.components.flatMap((component) => {
    const kinds = kindsOf(component);
    if (!kinds.length) return [];
    const type = componentTypeById(component.type)!;
    return [{ tag: component.tag, kinds, label: `${component.tag} — ${component.label ?? type.label}: ${kinds.map((k) => KIND_WORDS[k]).join(' or ')}` }];
  });
}

/**
 * A variation bound to its component: the input that changes it from a state (false: as drawn,
 * true: pressed, struck, switched over, failed or lost), and whether it may change again.
 */
export interface BoundVariation extends Variation {
  /** The input that takes it out of `state`. */
  command(state: boolean): InputCommand;
  /** A failure or loss happens once and stays. */
  once: boolean;
}

function buttonCommand(operation: HandOperation): (state: boolean) => InputCommand {
  // A held button is pressed and released; a struck one (emergency stop) is reset by a twist (toggle); a switched one flips.
  if (operation === 'hold') return (state) => ({ action: state ? 'release' : 'press' });
  if (operation === 'strike') return (state) => ({ action: state ? 'toggle' : 'press' });
  return () => ({ action: 'toggle' });
}

const ONCE: Readonly<Record<Exclude<VariationKind, 'button'>, InputCommand>> = {
  'sensor-stuck-on': { action: 'set', parameter: 'stuck', value: 1 },
  'sensor-stuck-off': { action: 'set', parameter: 'stuck', value: 0 },
  'supply-loss': { action: 'set', parameter: 'pressure', value: 0 },
  'power-loss': { action: 'set', parameter: 'power', value: 0 },
};

/** Binds the variations to the document's components; throws with a message naming every one it cannot bind. */
export function bindVariations(document: CircuitDocument, variations: readonly Variation[]): BoundVariation[] {
  const problems: string[] = [];
  const seen = new Set<string>();
  const bound = variations.flatMap((variation): BoundVariation[] => {
    const key = `${variation.tag}:${variation.kind}`;
    if (seen.has(key)) problems.push(`${key} is given twice`);
    seen.add(key);
    const component = document.components.find((c) => c.tag === variation.tag);
    if (!component) {
      problems.push(`no component tagged ${variation.tag}`);
      return [];
    }
    const kinds = kindsOf(component);
    if (!kinds.includes(variation.kind)) {
      problems.push(`${variation.tag} cannot vary as ${variation.kind}${kinds.length ? ` (it can: ${kinds.join(', ')})` : ' (nothing about it can be varied)'}`);
      return [];
    }
    if (variation.kind === 'button') return [{ ...variation, once: false, command: buttonCommand(handOperation(component)!) }];
    const command = ONCE[variation.kind];
    return [{ ...variation, once: true, command: () => command }];
  });
  if (problems.length) throw new Error(`cannot vary: ${problems.join('; ')}`);
  return bound;
}
