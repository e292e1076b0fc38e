import type { ParameterSpec } from './types';

/**
 * Parameter specs shared by several component types. Defaults are typical
 * catalogue magnitudes for 1/8"–1/4" industrial pneumatics (from memory,
 * no single catalogue): the engineer replaces them with the data of the part.
 */
export const conductanceParam = (label: string, defaultC: number): ParameterSpec => ({
  kind: 'number',
  quantity: 'conductance',
  label,
  default: defaultC,
  min: 1e-11,
  max: 1e-6,
  description: 'ISO 6358 sonic conductance C of the open passage.',
});

export const criticalRatioParam: ParameterSpec = {
  kind: 'number',
  quantity: 'ratio',
  label: 'Critical pressure ratio b',
  default: 0.3,
  min: 0,
  max: 0.99,
  description: 'ISO 6358 critical back-pressure ratio of the open passage.',
};

export const switchTimeParam: ParameterSpec = {
  kind: 'number',
  quantity: 'time',
  label: 'Switching time',
  default: 0.015,
  min: 0,
  max: 2,
  description: 'Delay from actuation to the spool reaching its new position.',
};

export const pilotThresholdParam: ParameterSpec = {
  kind: 'number',
  quantity: 'pressure-gauge',
  label: 'Pilot switching pressure',
  default: 200_000,
  min: 10_000,
  max: 1_000_000,
  description: 'Gauge pressure on a pilot port at which the spool switches.',
};

export const pilotHysteresisParam: ParameterSpec = {
  kind: 'number',
  quantity: 'pressure-difference',
  label: 'Pilot release margin',
  default: 50_000,
  min: 0,
  max: 500_000,
  description: 'How far below the switching pressure the pilot must fall before the spool returns.',
};

export const portVolumeParam = (label: string, defaultV: number): ParameterSpec => ({
  kind: 'number',
  quantity: 'volume',
  label,
  default: defaultV,
  min: 1e-9,
  max: 10,
});

/** The same spec with another default (a shut-off valve is lever-operated, a small cylinder has a small bore). */
export function withDefault(spec: ParameterSpec, value: number | string | boolean): ParameterSpec {
  return { ...spec, default: value } as ParameterSpec;
}
