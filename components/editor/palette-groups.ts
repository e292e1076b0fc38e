import { COMPONENT_TYPES } from '@/engine/components/registry';
import type { Category, ComponentType } from '@/engine/components/types';

/** The palette follows the levels of a circuit drawing, from the air supply up to the actuators, then the control side. */
export const PALETTE_GROUPS: ReadonlyArray<{ id: string; title: string; categories: readonly Category[] }> = [
  { id: 'supply', title: 'Energy supply and air preparation', categories: ['supply', 'measurement'] },
  { id: 'input', title: 'Input and signal elements', categories: ['input'] },
  { id: 'logic', title: 'Logic and processing', categories: ['logic'] },
  { id: 'final', title: 'Final control valves', categories: ['final-valve'] },
  { id: 'actuator', title: 'Actuators', categories: ['actuator'] },
  { id: 'electrical', title: 'Electrical control', categories: ['electrical'] },
];

export interface PaletteGroup {
  id: string;
  title: string;
  types: readonly ComponentType[];
}

/** The registry's types by palette group, keeping registry order, filtered by a search text (label, id or description). */
export function paletteGroups(search: string, types: readonly ComponentType[] = COMPONENT_TYPES): PaletteGroup[] {
  const words = search.trim().toLowerCase().split(/\s+/).filter(Boolean);
  const matches = (type: ComponentType) => {
    const text = `${type.label} ${type.id} ${type.description}`.toLowerCase();
    return words.every((w) => text.includes(w));
  };
  return PALETTE_GROUPS.map((g) => ({ id: g.id, title: g.title, types: types.filter((t) => g.categories.includes(t.category) && matches(t)) })).filter(
    (g) => g.types.length > 0,
  );
}
