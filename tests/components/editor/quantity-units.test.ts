import { describe, expect, it } from 'vitest';
import {
  BAR_ABSOLUTE,
  DEGREES_CELSIUS,
  describeRange,
  displayUnitFor,
  formatDisplay,
  LITRES,
  METRES,
  QUANTITY_UNITS,
  roundSignificant,
} from '@/components/editor/quantity-units';
import { paAbsToBarGauge } from '@/engine/calc/units';
import { COMPONENT_TYPES } from '@/engine/components/registry';
import type { ParameterSpec, Quantity } from '@/engine/components/types';

type NumberSpec = Extract<ParameterSpec, { kind: 'number' }>;

// `satisfies` makes tsc fail when a Quantity is added to the engine and not listed here.
const EVERY_QUANTITY = {
  'pressure-gauge': true,
  'pressure-difference': true,
  length: true,
  volume: true,
  time: true,
  mass: true,
  force: true,
  damping: true,
  conductance: true,
  ratio: true,
  fraction: true,
  'volume-flow-anr': true,
  angle: true,
  voltage: true,
  count: true,
  torque: true,
  stiffness: true,
  inertia: true,
  'volume-per-angle': true,
} as const satisfies Record<Quantity, true>;

const numberSpecs: Array<{ where: string; spec: NumberSpec }> = COMPONENT_TYPES.flatMap((type) =>
  Object.entries(type.parameters).flatMap(([name, spec]) => (spec.kind === 'number' ? [{ where: `${type.id}.${name}`, spec }] : [])),
);

const specOf = (typeId: string, name: string) => numberSpecs.find((s) => s.where === `${typeId}.${name}`)!.spec;

describe('display units', () => {
  it('exist for every quantity, and only for those', () => {
    expect(Object.keys(QUANTITY_UNITS).sort()).toEqual(Object.keys(EVERY_QUANTITY).sort());
  });

  it('label every dimensioned quantity', () => {
    const plain = new Set<Quantity>(['ratio', 'count']);
    for (const [quantity, unit] of Object.entries(QUANTITY_UNITS)) {
      expect(unit.unit === '', quantity).toBe(plain.has(quantity as Quantity));
    }
  });

  it('show set points in bar gauge: 6 bar is 600 000 Pa above ambient, with no ambient offset', () => {
    const gauge = QUANTITY_UNITS['pressure-gauge'];
    expect(gauge.unit).toBe('bar (gauge)');
    expect(gauge.toDisplay(600_000)).toBe(6);
    expect(gauge.fromDisplay(6)).toBe(600_000);
    // The engine adds ambient to a set point (air-supply.ts); the absolute pressure read back as gauge is the same 6 bar.
    expect(paAbsToBarGauge(101_325 + gauge.fromDisplay(6), 101_325)).toBeCloseTo(6, 12);
    expect(QUANTITY_UNITS['pressure-difference'].fromDisplay(0.5)).toBe(50_000);
  });

  it('show sonic conductance as ISO 6358 data sheets do: 1 dm³/(s·bar) = 1e-8 m³/(s·Pa)', () => {
    const conductance = QUANTITY_UNITS.conductance;
    // 1 dm³ = 1e-3 m³ and 1 bar = 1e5 Pa.
    expect(conductance.fromDisplay(1)).toBe(1e-3 / 1e5);
    expect(conductance.toDisplay(1e-8)).toBe(1);
    expect(conductance.fromDisplay(0.02)).toBe(2e-10);
  });

  it('convert lengths, volumes, flows, angles and fractions by their definitions', () => {
    expect(QUANTITY_UNITS.length.fromDisplay(100)).toBe(0.1);
    expect(QUANTITY_UNITS.length.toDisplay(0.025)).toBe(25);
    expect(QUANTITY_UNITS.volume.fromDisplay(3)).toBe(3e-6);
    expect(LITRES.fromDisplay(1)).toBe(0.001);
    // 60 l/min = 1 l/s = 1e-3 m³/s.
    expect(QUANTITY_UNITS['volume-flow-anr'].fromDisplay(60)).toBe(1e-3);
    expect(QUANTITY_UNITS['volume-flow-anr'].toDisplay(1e-3)).toBe(60);
    expect(QUANTITY_UNITS.angle.toDisplay(Math.PI / 2)).toBe(90);
    expect(QUANTITY_UNITS.angle.fromDisplay(360)).toBe(2 * Math.PI);
    expect(QUANTITY_UNITS.fraction.toDisplay(0.35)).toBe(35);
    expect(QUANTITY_UNITS.time.fromDisplay(0.015)).toBe(0.015);
  });

  it('give torque, spring rate, inertia and swept volume per radian their own units, not those of a look-alike quantity', () => {
    // A spring of 400 N/m is 0.4 N/mm, as catalogues give it.
    expect(QUANTITY_UNITS.stiffness.unit).toBe('N/mm');
    expect(QUANTITY_UNITS.stiffness.toDisplay(400)).toBe(0.4);
    expect(QUANTITY_UNITS.stiffness.fromDisplay(2.5)).toBe(2500);
    expect(QUANTITY_UNITS.torque.unit).toBe('N·m');
    expect(QUANTITY_UNITS.inertia.unit).toBe('kg·m²');
    expect(QUANTITY_UNITS['volume-per-angle'].toDisplay(5e-6)).toBe(5);
    expect(displayUnitFor(specOf('cylinder-single-acting', 'springRate')).unit).toBe('N/mm');
    expect(displayUnitFor(specOf('semi-rotary-actuator', 'loadTorque')).unit).toBe('N·m');
    expect(displayUnitFor(specOf('semi-rotary-actuator', 'inertia')).unit).toBe('kg·m²');
    expect(displayUnitFor(specOf('semi-rotary-actuator', 'displacement')).unit).toBe('cm³/rad');
  });

  it('show ambient conditions as bar absolute and degrees Celsius', () => {
    expect(BAR_ABSOLUTE.toDisplay(101_325)).toBe(1.01325);
    expect(BAR_ABSOLUTE.fromDisplay(1.01325)).toBe(101_325);
    // 0 °C = 273.15 K by definition of the Celsius scale.
    expect(DEGREES_CELSIUS.fromDisplay(20)).toBe(293.15);
    expect(DEGREES_CELSIUS.toDisplay(293.15)).toBe(20);
    expect(METRES.fromDisplay(0.5)).toBe(0.5);
  });

  it('round-trip every registry default and bound, and show each default without conversion noise', () => {
    for (const { where, spec } of numberSpecs) {
      const unit = displayUnitFor(spec);
      for (const si of [spec.default, spec.min, spec.max]) {
        const back = unit.fromDisplay(unit.toDisplay(si));
        expect(Math.abs(back - si), where).toBeLessThanOrEqual(Math.abs(si) * 1e-12);
      }
      const text = formatDisplay(unit.toDisplay(spec.default), unit.significantDigits);
      expect(text, where).toMatch(/^-?\d+(\.\d{1,6})?$/);
      expect(unit.fromDisplay(Number(text)), where).toBe(spec.default);
    }
  });

  it('show vessels in litres and small chambers in cm³', () => {
    expect(displayUnitFor(specOf('reservoir', 'volume')).unit).toBe('l');
    expect(displayUnitFor(specOf('air-supply', 'receiverVolume')).unit).toBe('l');
    expect(displayUnitFor(specOf('cylinder-double-acting', 'deadVolumeCap')).unit).toBe('cm³');
  });
});

describe('rounding and ranges', () => {
  it('round to significant digits, outward bounds rounded inward', () => {
    expect(roundSignificant(2.8647889756541165, 3)).toBe(2.86);
    expect(roundSignificant(2.8647889756541165, 3, 'up')).toBe(2.87);
    expect(roundSignificant(2.8647889756541165, 3, 'down')).toBe(2.86);
    expect(roundSignificant(25.000000000000004, 6, 'up')).toBe(25);
    expect(roundSignificant(-1234.5, 3, 'down')).toBe(-1240);
    expect(roundSignificant(0, 3, 'up')).toBe(0);
    expect(formatDisplay(0.015000000000000001, 6)).toBe('0.015');
  });

  it('name the allowed range in display units', () => {
    expect(describeRange(QUANTITY_UNITS['pressure-gauge'], 10_000, 1_000_000)).toBe('between 0.1 and 10 bar (gauge)');
    expect(describeRange(QUANTITY_UNITS.count, 1, 1_000_000)).toBe('between 1 and 1000000');
    // 0.05 rad is 2.864788… °: written rounded up, so the number in the message is itself allowed.
    expect(describeRange(QUANTITY_UNITS.angle, 0.05, 2 * Math.PI)).toBe('between 2.86479 and 360 °');
  });
});
