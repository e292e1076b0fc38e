import { describe, expect, it } from 'vitest';
import { componentTypeById } from '@/engine/components/registry';
import { parameterDefaults } from '@/engine/components/types';

const handOf = (typeId: string, parameters: Record<string, string> = {}) => {
  const type = componentTypeById(typeId)!;
  return type.handOperation?.({ ...parameterDefaults(type), ...parameters }) ?? null;
};

describe('working a part by hand', () => {
  it('holds a valve worked by a push-button or mushroom head, switches one with a detent, and leaves other actuations alone', () => {
    expect(handOf('valve-3-2-nc')).toBe('hold');
    expect(handOf('valve-5-2', { actuation: 'mushroom' })).toBe('hold');
    expect(handOf('valve-5-2', { actuation: 'lever-detent' })).toBe('switch');
    expect(handOf('valve-5-3-closed')).toBe('switch'); // three positions: lever with detent by default
    for (const actuation of ['roller', 'one-way-roller', 'pilot', 'solenoid']) expect(handOf('valve-5-2', { actuation })).toBeNull();
  });

  it('holds push-buttons, switches the selector, strikes the emergency stop; coils, sensors and cylinders are not worked by hand', () => {
    expect(handOf('pushbutton-no')).toBe('hold');
    expect(handOf('pushbutton-nc')).toBe('hold');
    expect(handOf('selector-switch')).toBe('switch');
    expect(handOf('emergency-stop')).toBe('strike');
    for (const typeId of ['relay-coil', 'proximity-sensor-reed', 'cylinder-double-acting']) expect(handOf(typeId)).toBeNull();
  });
});
