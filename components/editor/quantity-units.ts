import { m3PerSToLitresPerMinute, litresPerMinuteToM3PerS, mmToM, mToMm, PA_PER_BAR } from '@/engine/calc/units';
import { ZERO_CELSIUS_K } from '@/engine/calc/constants';
import type { ParameterSpec, Quantity } from '@/engine/components/types';

/**
 * The units the editor shows. The document and the engine stay SI; every number a person
 * reads or types goes through one of these, and always appears with its unit.
 */

export interface DisplayUnit {
  /** Written beside the field and in its messages; empty for plain numbers. */
  unit: string;
  toDisplay(si: number): number;
  fromDisplay(display: number): number;
  /**
   * Significant digits shown: more than anyone types into a parameter, fewer than the noise a
   * unit conversion leaves in a double (so 0.015 s reads "0.015", not "0.015000000000000001").
   */
  significantDigits: number;
  /** Only whole numbers make sense (counts). */
  wholeNumbers?: boolean;
}

/**
 * Snaps a converted value to the short decimal it is a few rounding steps away from (0.3 bar
 * → 30000.000000000004 Pa → 30000), so typed round numbers store as round numbers and equal
 * the defaults they match. Values that are not near one (2π rad) are left exactly as they are.
 */
function clean(value: number): number {
  if (!Number.isFinite(value) || value === 0) return value;
  const short = Number(value.toPrecision(12));
  return Math.abs(short - value) <= Math.abs(value) * 8 * Number.EPSILON ? short : value;
}

function unitOf(unit: string, toDisplay: (si: number) => number, fromDisplay: (display: number) => number, significantDigits = 6): DisplayUnit {
  return { unit, toDisplay: (si) => clean(toDisplay(si)), fromDisplay: (display) => clean(fromDisplay(display)), significantDigits };
}

// Factors are exact integers, so each direction is within a rounding step of the true value, which `clean` takes back.
const timesInteger = (unit: string, displayPerSi: number) => unitOf(unit, (si) => si * displayPerSi, (display) => display / displayPerSi);
const dividedByInteger = (unit: string, siPerDisplay: number) => unitOf(unit, (si) => si / siPerDisplay, (display) => display * siPerDisplay);
const asIs = (unit: string) => unitOf(unit, (si) => si, (display) => display);

/** cm³: cylinder dead volumes and small chambers are a few cm³. */
const CUBIC_CENTIMETRES = timesInteger('cm³', 1_000_000);

/** Litres, for receivers and reservoirs (catalogues size them in litres). */
export const LITRES = timesInteger('l', 1000);

/**
 * One display unit per quantity. Time is always seconds (a 15 ms switching time reads 0.015 s):
 * one unit per quantity keeps a field from changing its unit as its value crosses 1 s.
 */
export const QUANTITY_UNITS: Readonly<Record<Quantity, DisplayUnit>> = {
  // Set points are stored as Pa above ambient already (see engine/components/types.ts), so gauge bar is a plain scale.
  'pressure-gauge': dividedByInteger('bar (gauge)', PA_PER_BAR),
  'pressure-difference': dividedByInteger('bar', PA_PER_BAR),
  length: unitOf('mm', mToMm, mmToM),
  volume: CUBIC_CENTIMETRES,
  time: asIs('s'),
  mass: asIs('kg'),
  force: asIs('N'),
  torque: asIs('N·m'),
  // Catalogues give spring rates per millimetre of compression.
  stiffness: unitOf('N/mm', (nPerM) => nPerM / 1000, (nPerMm) => nPerMm * 1000),
  inertia: asIs('kg·m²'),
  'volume-per-angle': timesInteger('cm³/rad', 1_000_000),
  damping: asIs('N·s/m'),
  // ISO 6358 data sheets: 1 dm³/(s·bar) = 1e-3 m³ / (s · 1e5 Pa) = 1e-8 m³/(s·Pa).
  conductance: timesInteger('l/(s·bar)', 100_000_000),
  ratio: asIs(''),
  fraction: timesInteger('%', 100),
  'volume-flow-anr': unitOf('l/min (ANR)', m3PerSToLitresPerMinute, litresPerMinuteToM3PerS),
  angle: unitOf('°', (rad) => (rad * 180) / Math.PI, (deg) => (deg * Math.PI) / 180),
  voltage: asIs('V'),
  count: { ...asIs(''), significantDigits: 7, wholeNumbers: true },
};

/** Tube lengths: tubing is cut and bought by the metre. */
export const METRES = asIs('m');

/** Ambient pressure is absolute (it is the reference gauge readings start from). */
export const BAR_ABSOLUTE = dividedByInteger('bar (absolute)', PA_PER_BAR);

export const DEGREES_CELSIUS = unitOf('°C', (k) => k - ZERO_CELSIUS_K, (c) => c + ZERO_CELSIUS_K);

/** Volume parameters that may reach a cubic metre or more are vessels, shown in litres. */
const LITRES_FROM_MAX_M3 = 1;

type NumberSpec = Extract<ParameterSpec, { kind: 'number' }>;

/** The unit a number parameter is shown in. */
export function displayUnitFor(spec: Pick<NumberSpec, 'quantity' | 'max'>): DisplayUnit {
  if (spec.quantity === 'volume' && spec.max >= LITRES_FROM_MAX_M3) return LITRES;
  return QUANTITY_UNITS[spec.quantity];
}

export type Rounding = 'nearest' | 'up' | 'down';

/** Rounds to significant digits; a range is written with its low end rounded up and its high end down, so both stay inside it. */
export function roundSignificant(value: number, digits: number, rounding: Rounding = 'nearest'): number {
  if (value === 0 || !Number.isFinite(value)) return value;
  if (rounding === 'nearest') return Number(value.toPrecision(digits));
  const step = 10 ** (Math.floor(Math.log10(Math.abs(value))) - digits + 1);
  // The slack keeps conversion noise (25.000000000000004) from rounding up a whole step.
  const steps = value / step;
  const whole = rounding === 'up' ? Math.ceil(steps - 1e-9) : Math.floor(steps + 1e-9);
  return Number((whole * step).toPrecision(digits));
}

/** A displayed number as text: no exponent for everyday magnitudes, no trailing zeros. */
export function formatDisplay(display: number, digits: number, rounding: Rounding = 'nearest'): string {
  return String(roundSignificant(display, digits, rounding));
}

/** An SI value as text in a display unit, with the unit. */
export function formatWithUnit(si: number, unit: DisplayUnit, digits = unit.significantDigits): string {
  const text = formatDisplay(unit.toDisplay(si), digits);
  return unit.unit ? `${text} ${unit.unit}` : text;
}

/** "between 0.1 and 10 bar (gauge)": the allowed range of an SI value, in display units. */
export function describeRange(unit: DisplayUnit, minSi: number, maxSi: number): string {
  const low = formatDisplay(unit.toDisplay(minSi), unit.significantDigits, 'up');
  const high = formatDisplay(unit.toDisplay(maxSi), unit.significantDigits, 'down');
  return `between ${low} and ${high}${unit.unit ? ` ${unit.unit}` : ''}`;
}
