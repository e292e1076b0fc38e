import { z } from 'zod';
import { componentTypeById } from '@/engine/components/registry';
import { parameterDefaults, type ComponentType, type ParameterSpec } from '@/engine/components/types';
import type { CircuitComponent, CircuitDocument, Tube } from '@/engine/document/schema';
import {
  AMBIENT_PRESSURE_LIMITS,
  AMBIENT_TEMPERATURE_LIMITS,
  LABEL_MAX,
  NOTES_MAX,
  TAG_MAX,
  tagProblem,
  TUBE_BORE_LIMITS,
  TUBE_LENGTH_LIMITS,
  type ValueLimits,
} from './inspector-commands';
import { describeRange, displayUnitFor, formatDisplay, type DisplayUnit } from './quantity-units';

/**
 * The inspector's forms without React: what each field holds (text in display units), and the
 * zod schemas that check that text and turn it into the SI value the document stores. The
 * form library runs these schemas; the tests run them directly.
 */

export type FieldValue = string | boolean;
export type ParameterValue = number | string | boolean;

export interface ComponentFormValues {
  tag: string;
  label: string;
  notes: string;
  parameters: Record<string, FieldValue>;
}

export interface TubeFormValues {
  length: string;
  innerDiameter: string;
}

export interface SettingsFormValues {
  ambientPressure: string;
  ambientTemperature: string;
}

const NUMBER_SHAPE = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)(e[+-]?\d+)?$/i;

/**
 * A typed number, or null. A decimal comma is read as a point (many engineers type one);
 * Number() alone would also take "", " " and "0x10".
 */
export function parseDisplayNumber(text: string): number | null {
  const trimmed = text.trim();
  return NUMBER_SHAPE.test(trimmed) ? Number(trimmed.replace(',', '.')) : null;
}

/** Text in a display unit → SI value within [minSi, maxSi], with a message naming the range in that unit. */
export function quantityFieldSchema(unit: DisplayUnit, minSi: number, maxSi: number): z.ZodType<number, string> {
  const low = unit.toDisplay(minSi);
  const high = unit.toDisplay(maxSi);
  const message = `Enter ${unit.wholeNumbers ? 'a whole number' : 'a number'} ${describeRange(unit, minSi, maxSi)}.`;
  // The slack absorbs conversion noise at the bounds; clamping keeps the stored value inside them.
  const slack = (bound: number) => Math.abs(bound) * 1e-9;
  return z.string().transform((text, ctx) => {
    const value = parseDisplayNumber(text);
    if (value === null || value < low - slack(low) || value > high + slack(high) || (unit.wholeNumbers && !Number.isInteger(value))) {
      ctx.addIssue({ code: 'custom', message });
      return z.NEVER;
    }
    return Math.min(maxSi, Math.max(minSi, unit.fromDisplay(value)));
  });
}

const limitsFieldSchema = (limits: ValueLimits) => quantityFieldSchema(limits.unit, limits.minSi, limits.maxSi);

/** One parameter's field: text for numbers, choices and tags; a tick for flags. */
export function parameterFieldSchema(spec: ParameterSpec): z.ZodType<ParameterValue, FieldValue> {
  switch (spec.kind) {
    case 'number':
      return quantityFieldSchema(displayUnitFor(spec), spec.min, spec.max);
    case 'choice':
      return z.string().refine((value) => spec.options.includes(value), 'Pick one of the listed options.');
    case 'flag':
      return z.boolean();
    case 'tag':
      return z
        .string()
        .trim()
        .min(1, `Enter the tag of ${spec.refers === 'coil' ? 'a relay, timer relay or counter' : 'a valve'}.`)
        .max(TAG_MAX, `A tag has at most ${TAG_MAX} characters.`);
  }
}

/** The component's tag, refused when another component already has it. */
function tagFieldSchema(document: CircuitDocument, componentId: string): z.ZodType<string, string> {
  return z.string().transform((text, ctx) => {
    const tag = text.trim();
    const problem = tagProblem(document, componentId, tag);
    if (problem) {
      ctx.addIssue({ code: 'custom', message: problem });
      return z.NEVER;
    }
    return tag;
  });
}

const labelFieldSchema: z.ZodType<string, string> = z.string().trim().max(LABEL_MAX, `A label has at most ${LABEL_MAX} characters.`);
const notesFieldSchema: z.ZodType<string, string> = z.string().trim().max(NOTES_MAX, `Notes have at most ${NOTES_MAX} characters.`);

export function componentFormSchema(document: CircuitDocument, componentId: string, type: ComponentType | undefined) {
  const parameters = Object.entries(type?.parameters ?? {}).map(([name, spec]) => [name, parameterFieldSchema(spec)] as const);
  return z.object({
    tag: tagFieldSchema(document, componentId),
    label: labelFieldSchema,
    notes: notesFieldSchema,
    parameters: z.object(Object.fromEntries(parameters)),
  });
}

/** The values the component works with: its stored parameters over its type's defaults. */
export function effectiveParameters(component: CircuitComponent, type: ComponentType): Record<string, ParameterValue> {
  const stored = Object.entries(component.parameters).filter(([name]) => name in type.parameters);
  return { ...parameterDefaults(type), ...Object.fromEntries(stored) };
}

/** A stored value as its field shows it. A stored value of the wrong kind is shown as it is, to be corrected. */
export function parameterFieldValue(spec: ParameterSpec, value: ParameterValue): FieldValue {
  if (spec.kind === 'flag') return value === true;
  if (spec.kind === 'number' && typeof value === 'number') {
    const unit = displayUnitFor(spec);
    return formatDisplay(unit.toDisplay(value), unit.significantDigits);
  }
  return String(value);
}

export function componentFormValues(component: CircuitComponent, type: ComponentType | undefined): ComponentFormValues {
  const values = type ? effectiveParameters(component, type) : {};
  const parameters = Object.entries(type?.parameters ?? {}).map(([name, spec]) => [name, parameterFieldValue(spec, values[name]!)] as const);
  return { tag: component.tag, label: component.label ?? '', notes: component.notes ?? '', parameters: Object.fromEntries(parameters) };
}

const shown = (si: number, unit: DisplayUnit) => formatDisplay(unit.toDisplay(si), unit.significantDigits);

export const tubeFormSchema = z.object({ length: limitsFieldSchema(TUBE_LENGTH_LIMITS), innerDiameter: limitsFieldSchema(TUBE_BORE_LIMITS) });

export function tubeFormValues(tube: Tube): TubeFormValues {
  return { length: shown(tube.lengthM, TUBE_LENGTH_LIMITS.unit), innerDiameter: shown(tube.innerDiameterM, TUBE_BORE_LIMITS.unit) };
}

export const settingsFormSchema = z.object({
  ambientPressure: limitsFieldSchema(AMBIENT_PRESSURE_LIMITS),
  ambientTemperature: limitsFieldSchema(AMBIENT_TEMPERATURE_LIMITS),
});

export function settingsFormValues(settings: CircuitDocument['settings']): SettingsFormValues {
  return {
    ambientPressure: shown(settings.ambientPressurePa, AMBIENT_PRESSURE_LIMITS.unit),
    ambientTemperature: shown(settings.ambientTemperatureK, AMBIENT_TEMPERATURE_LIMITS.unit),
  };
}

/** Types whose coil switches contacts named by its tag (as engine/solver/electrical-diagnostics.ts reads them). */
const CONTACT_COIL_TYPES = new Set(['relay-coil', 'timer-relay-on-delay', 'timer-relay-off-delay', 'counter']);

/** The tags a tag parameter may name: coils for a contact, directional control valves for a solenoid coil. */
export function tagChoices(document: CircuitDocument, refers: Extract<ParameterSpec, { kind: 'tag' }>['refers']): string[] {
  const fits = (type: ComponentType) => (refers === 'coil' ? CONTACT_COIL_TYPES.has(type.id) : type.positions !== undefined);
  return document.components
    .filter((c) => {
      const type = componentTypeById(c.type);
      return type !== undefined && fits(type);
    })
    .map((c) => c.tag)
    .sort((a, b) => a.localeCompare(b, 'en', { numeric: true }));
}
