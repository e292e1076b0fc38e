import type { ComponentType } from '@/engine/components/types';

/**
 * Designations for new components, as circuit drawings number them (common practice):
 * the air supply and its preparation are group 0 (0Z1, 0Z2 …); signal elements of the first
 * chain are 1S1 …, processing and final control valves 1V1 …; each new actuator opens the
 * next chain (1A1, 2A1 …); electrical parts take the letter of their kind (S switches,
 * B sensors, K relays, KT timer relays, KC counters, M solenoids of chain 1, H lamps, G supplies,
 * R diodes). Contacts are named after their coil by the user (K1.1), so they start as "K?.1".
 */
const PREFIX_BY_TYPE: Readonly<Record<string, string>> = {
  'dc-supply': 'G',
  'pushbutton-no': 'S',
  'pushbutton-nc': 'S',
  'selector-switch': 'S',
  'emergency-stop': 'S',
  'limit-switch': 'S',
  'proximity-sensor-reed': 'B',
  'proximity-sensor-inductive': 'B',
  'pressure-switch': 'B',
  'relay-coil': 'K',
  'timer-relay-on-delay': 'KT',
  'timer-relay-off-delay': 'KT',
  counter: 'KC',
  'solenoid-coil': '1M',
  'indicator-lamp': 'H',
  diode: 'R',
  'pressure-gauge': '0P',
};

const PREFIX_BY_CATEGORY: Readonly<Record<ComponentType['category'], string>> = {
  supply: '0Z',
  measurement: '0P',
  input: '1S',
  logic: '1V',
  'final-valve': '1V',
  actuator: 'A',
  electrical: 'X',
};

const CONTACT_TYPES = new Set(['relay-contact-no', 'relay-contact-nc']);

/** The next free designation for a component of this type, given the tags already in the circuit. */
export function nextTag(type: Pick<ComponentType, 'id' | 'category'>, taken: Iterable<string>): string {
  const used = new Set([...taken].map((tag) => tag.toUpperCase()));
  const free = (make: (n: number) => string) => {
    for (let n = 1; ; n += 1) if (!used.has(make(n).toUpperCase())) return make(n);
  };
  if (CONTACT_TYPES.has(type.id)) return free((n) => `K?.${n}`);
  const prefix = PREFIX_BY_TYPE[type.id] ?? PREFIX_BY_CATEGORY[type.category];
  // An actuator opens a chain: 1A1, 2A1, 3A1 …
  if (prefix === 'A') return free((n) => `${n}A1`);
  return free((n) => `${prefix}${n}`);
}
