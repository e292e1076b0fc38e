import { z } from 'zod';

/**
 * The circuit document: one JSON value per revision. SI units throughout
 * (Pa absolute, m, K, s); the UI converts at its edges.
 */
export const CURRENT_SCHEMA_VERSION = 1 as const;

const identifier = z
  .string()
  .min(1)
  .max(64)
  .regex(/^[A-Za-z0-9_.-]+$/, 'use letters, digits, dot, dash or underscore');

/** Drawing position in canvas units (1 unit = 1 px at 100 % zoom). */
const position = z.object({ x: z.number().finite(), y: z.number().finite() });

const parameterValue = z.union([z.number().finite(), z.string().max(200), z.boolean()]);

export const componentSchema = z.object({
  id: identifier,
  /** Stable type id from the component registry, such as `valve-5-2`. */
  type: z.string().min(1).max(64),
  /** Designation as the trade writes it: 1A1, 1V1, 1S1, 1M1, K1, S1. */
  tag: z.string().min(1).max(16),
  label: z.string().max(120).optional(),
  /** Free text for whoever reads the drawing: why a setting is what it is, what to check on site. */
  notes: z.string().max(2000).optional(),
  /** Parameters in SI units, keyed by the type's parameter names. */
  parameters: z.record(z.string(), parameterValue).default({}),
  position,
  rotation: z.union([z.literal(0), z.literal(90), z.literal(180), z.literal(270)]).default(0),
  mirrored: z.boolean().default(false),
});

/** A port of a component, named as ISO 11727 / ISO 5599-3 number them ("1", "2", "14" ...). */
const portRef = z.object({ component: identifier, port: z.string().min(1).max(16) });

export const tubeSchema = z.object({
  id: identifier,
  from: portRef,
  to: portRef,
  /** Tube length, m. */
  lengthM: z.number().positive().max(1000),
  /** Inner diameter, m. */
  innerDiameterM: z.number().positive().max(0.2),
  /**
   * A leak to atmosphere somewhere along the tube (a cut, a loose fitting), ISO 6358 sonic
   * conductance C in m³/(s·Pa); absent or 0 means tight. Left out rather than defaulted so that
   * stored documents read back unchanged.
   */
  leakConductance: z.number().nonnegative().max(1e-6).optional(),
  bends: z.array(position).max(64).default([]),
});

export const wireSchema = z.object({
  id: identifier,
  from: portRef,
  to: portRef,
  bends: z.array(position).max(64).default([]),
});

/** A non-pneumatic coupling: coil to valve, or cylinder stroke position to a sensor or roller. */
export const linkSchema = z.object({
  id: identifier,
  kind: z.enum(['solenoid', 'actuation']),
  from: identifier,
  to: identifier,
  /** For actuation links: the stroke position that actuates, m from the retracted end. */
  positionM: z.number().nonnegative().optional(),
});

export const settingsSchema = z.object({
  /** Ambient (atmospheric) pressure, Pa absolute. */
  ambientPressurePa: z.number().positive().default(101_325),
  /** Ambient temperature, K. */
  ambientTemperatureK: z.number().positive().default(293.15),
});

export const circuitDocumentSchema = z.object({
  schemaVersion: z.literal(CURRENT_SCHEMA_VERSION),
  settings: settingsSchema.default({ ambientPressurePa: 101_325, ambientTemperatureK: 293.15 }),
  components: z.array(componentSchema).max(2000).default([]),
  tubes: z.array(tubeSchema).max(5000).default([]),
  wires: z.array(wireSchema).max(5000).default([]),
  links: z.array(linkSchema).max(2000).default([]),
});

export type CircuitDocument = z.infer<typeof circuitDocumentSchema>;
export type CircuitComponent = z.infer<typeof componentSchema>;
export type Tube = z.infer<typeof tubeSchema>;

export function emptyDocument(): CircuitDocument {
  return circuitDocumentSchema.parse({ schemaVersion: CURRENT_SCHEMA_VERSION });
}
