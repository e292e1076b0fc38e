import { describe, expect, it } from 'vitest';
import { paletteGroups } from '@/components/editor/palette-groups';
import { COMPONENT_TYPES } from '@/engine/components/registry';

describe('palette', () => {
  it('shows every registry type exactly once, in the levels of a circuit drawing', () => {
    const groups = paletteGroups('');
    const shown = groups.flatMap((g) => g.types.map((t) => t.id));
    expect(shown.sort()).toEqual(COMPONENT_TYPES.map((t) => t.id).sort());
    expect(groups.map((g) => g.title)).toEqual([
      'Energy supply and air preparation',
      'Input and signal elements',
      'Logic and processing',
      'Final control valves',
      'Actuators',
      'Electrical control',
    ]);
  });

  it('narrows to the types whose label, id or description holds every search word, dropping empty groups', () => {
    const groups = paletteGroups('  flow  CONTROL ');
    expect(groups.flatMap((g) => g.types.map((t) => t.id))).toEqual(['one-way-flow-control']);
    expect(paletteGroups('relay').flatMap((g) => g.types.map((t) => t.id))).toEqual(expect.arrayContaining(['relay-coil', 'relay-contact-no', 'relay-contact-nc']));
    expect(paletteGroups('no such part')).toEqual([]);
  });
});
