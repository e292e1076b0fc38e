import { componentTypeById } from '@/engine/components/registry';
import type { ParameterSpec } from '@/engine/components/types';
import { componentSchema, tubeSchema, type CircuitDocument } from '@/engine/document/schema';
import { BAR_ABSOLUTE, DEGREES_CELSIUS, describeRange, displayUnitFor, METRES, QUANTITY_UNITS, type DisplayUnit } from './quantity-units';

/**
 * Edits made from the inspector, as immer recipes on the document (run by the editor store as
 * one undo step each). Each checks its value and leaves the document untouched when it refuses,
 * so a refused edit leaves no undo step either.
 */

export type CommandResult = { ok: true } | { ok: false; reason: string };

/** Runs a recipe on the document as one undo step named `label` (the editor store's `edit`). */
export type DocumentEdit = <T>(label: string, recipe: (draft: CircuitDocument) => T) => T;

const OK: CommandResult = { ok: true };
const refuse = (reason: string): CommandResult => ({ ok: false, reason });
const COMPONENT_GONE = refuse('That component is no longer in the circuit.');

/** The SI range a value may take and the unit its messages speak. */
export interface ValueLimits {
  minSi: number;
  maxSi: number;
  unit: DisplayUnit;
}

// Lower ends are ours: the document schema only asks for a positive size, but below these a tube is a typo.
export const TUBE_LENGTH_LIMITS: ValueLimits = { minSi: 0.001, maxSi: tubeSchema.shape.lengthM.maxValue!, unit: METRES };
export const TUBE_BORE_LIMITS: ValueLimits = { minSi: 0.0005, maxSi: tubeSchema.shape.innerDiameterM.maxValue!, unit: QUANTITY_UNITS.length };

// From above the highest towns (about 0.5 bar) to the deepest mine shafts; outside that a value is a unit mix-up (101325 typed as bar).
export const AMBIENT_PRESSURE_LIMITS: ValueLimits = { minSi: 30_000, maxSi: 120_000, unit: BAR_ABSOLUTE };
// −50 °C to 100 °C: wider than any pneumatic part is rated for, narrow enough to catch kelvin typed as °C.
export const AMBIENT_TEMPERATURE_LIMITS: ValueLimits = { minSi: 223.15, maxSi: 373.15, unit: DEGREES_CELSIUS };

export const TAG_MAX = componentSchema.shape.tag.maxLength!;
export const LABEL_MAX = componentSchema.shape.label.unwrap().maxLength!;
export const NOTES_MAX = componentSchema.shape.notes.unwrap().maxLength!;

function rangeProblem(what: string, value: number, limits: ValueLimits): string | null {
  if (Number.isFinite(value) && value >= limits.minSi && value <= limits.maxSi) return null;
  return `${what} must be ${describeRange(limits.unit, limits.minSi, limits.maxSi)}.`;
}

/**
 * Why a tag cannot name this component, or null. Tags are compared ignoring case, as drawings
 * are read aloud and numbered that way (tags.ts numbers new parts the same way).
 */
export function tagProblem(document: CircuitDocument, componentId: string, tag: string): string | null {
  if (tag === '') return 'Enter a tag.';
  if (tag.length > TAG_MAX) return `A tag has at most ${TAG_MAX} characters.`;
  const wanted = tag.toUpperCase();
  const other = document.components.find((c) => c.id !== componentId && c.tag.toUpperCase() === wanted);
  if (!other) return null;
  const typeLabel = componentTypeById(other.type)?.label ?? other.type;
  return `${other.tag} already names another component (${typeLabel}).`;
}

/** Renames a component. Surrounding spaces are dropped. */
export function setTag(draft: CircuitDocument, componentId: string, tag: string): CommandResult {
  const component = draft.components.find((c) => c.id === componentId);
  if (!component) return COMPONENT_GONE;
  const wanted = tag.trim();
  const problem = tagProblem(draft, componentId, wanted);
  if (problem) return refuse(problem);
  const previous = component.tag;
  component.tag = wanted;
  // Contacts name their coil and coils their valve by tag: they follow the rename rather than lose their part.
  for (const other of draft.components) {
    const type = componentTypeById(other.type);
    for (const [name, spec] of Object.entries(type?.parameters ?? {})) {
      if (spec.kind !== 'tag') continue;
      if ((other.parameters[name] ?? spec.default) === previous) other.parameters[name] = wanted;
    }
  }
  return OK;
}

/** Sets the free-text label under a tag; an empty label removes it. */
export function setLabel(draft: CircuitDocument, componentId: string, label: string): CommandResult {
  const component = draft.components.find((c) => c.id === componentId);
  if (!component) return COMPONENT_GONE;
  const wanted = label.trim();
  if (wanted.length > LABEL_MAX) return refuse(`A label has at most ${LABEL_MAX} characters.`);
  if (wanted === '') delete component.label;
  else component.label = wanted;
  return OK;
}

export function setNotes(draft: CircuitDocument, componentId: string, notes: string): CommandResult {
  const component = draft.components.find((c) => c.id === componentId);
  if (!component) return COMPONENT_GONE;
  const wanted = notes.trim();
  if (wanted.length > NOTES_MAX) return refuse(`Notes have at most ${NOTES_MAX} characters.`);
  if (wanted === '') delete component.notes;
  else component.notes = wanted;
  return OK;
}

function parameterProblem(spec: ParameterSpec, value: number | string | boolean): string | null {
  switch (spec.kind) {
    case 'number': {
      const unit = displayUnitFor(spec);
      const problem = typeof value === 'number' ? rangeProblem(spec.label, value, { minSi: spec.min, maxSi: spec.max, unit }) : `${spec.label} must be a number.`;
      if (problem || !unit.wholeNumbers || Number.isInteger(value)) return problem;
      return `${spec.label} must be a whole number.`;
    }
    case 'choice':
      return typeof value === 'string' && spec.options.includes(value) ? null : `${spec.label} must be one of ${spec.options.join(', ')}.`;
    case 'flag':
      return typeof value === 'boolean' ? null : `${spec.label} must be on or off.`;
    case 'tag':
      return typeof value === 'string' && value !== '' && value.length <= TAG_MAX ? null : `${spec.label} must be a tag of 1 to ${TAG_MAX} characters.`;
  }
}

/**
 * Sets a parameter, in SI units. A value equal to the type's default is stored as no value at
 * all: the engine applies defaults to missing parameters, new components start with none, and
 * a document then lists only what the engineer changed.
 */
export function setParameter(draft: CircuitDocument, componentId: string, name: string, value: number | string | boolean): CommandResult {
  const component = draft.components.find((c) => c.id === componentId);
  if (!component) return COMPONENT_GONE;
  const type = componentTypeById(component.type);
  const spec = type?.parameters[name];
  if (!spec) return refuse(`${type?.label ?? component.type} has no parameter “${name}”.`);
  const wanted = spec.kind === 'tag' && typeof value === 'string' ? value.trim() : value;
  const problem = parameterProblem(spec, wanted);
  if (problem) return refuse(problem);
  if (wanted === spec.default) delete component.parameters[name];
  else component.parameters[name] = wanted;
  return OK;
}

/** Resizes a tube; only the given sizes change. */
export function setTube(draft: CircuitDocument, tubeId: string, size: { lengthM?: number; innerDiameterM?: number }): CommandResult {
  const tube = draft.tubes.find((t) => t.id === tubeId);
  if (!tube) return refuse('That tube is no longer in the circuit.');
  const problem =
    (size.lengthM !== undefined && rangeProblem('Tube length', size.lengthM, TUBE_LENGTH_LIMITS)) ||
    (size.innerDiameterM !== undefined && rangeProblem('Inner diameter', size.innerDiameterM, TUBE_BORE_LIMITS));
  if (problem) return refuse(problem);
  if (size.lengthM !== undefined) tube.lengthM = size.lengthM;
  if (size.innerDiameterM !== undefined) tube.innerDiameterM = size.innerDiameterM;
  return OK;
}

/** Changes the circuit's ambient conditions; only the given ones change. */
export function setSettings(draft: CircuitDocument, settings: { ambientPressurePa?: number; ambientTemperatureK?: number }): CommandResult {
  const problem =
    (settings.ambientPressurePa !== undefined && rangeProblem('Ambient pressure', settings.ambientPressurePa, AMBIENT_PRESSURE_LIMITS)) ||
    (settings.ambientTemperatureK !== undefined && rangeProblem('Ambient temperature', settings.ambientTemperatureK, AMBIENT_TEMPERATURE_LIMITS));
  if (problem) return refuse(problem);
  if (settings.ambientPressurePa !== undefined) draft.settings.ambientPressurePa = settings.ambientPressurePa;
  if (settings.ambientTemperatureK !== undefined) draft.settings.ambientTemperatureK = settings.ambientTemperatureK;
  return OK;
}

/**
 * The undo step's name for a parameter change: "Set 1V1 switching time". A trailing aside in
 * the label ("(0 = none)") is dropped; a leading capital is kept where it starts an acronym.
 */
export function parameterEditLabel(tag: string, spec: Pick<ParameterSpec, 'label'>): string {
  const field = spec.label.replace(/\s*\([^()]*\)\s*$/, '');
  const spoken = /^[A-Z][a-z]/.test(field) ? field[0]!.toLowerCase() + field.slice(1) : field;
  return `Set ${tag} ${spoken}`;
}
