import type { ParameterSpec } from './types';

/**
 * Parameters every linear cylinder shares. Defaults describe a 32 mm bore,
 * 12 mm rod, 100 mm stroke cylinder moving a light tool (catalogue sizes of
 * ISO 15552 / ISO 6432 ranges; friction and dead volumes from memory).
 */
export const cylinderParameters: Record<string, ParameterSpec> = {
  bore: { kind: 'number', quantity: 'length', label: 'Bore', default: 0.032, min: 0.004, max: 0.4 },
  rod: { kind: 'number', quantity: 'length', label: 'Rod diameter', default: 0.012, min: 0.002, max: 0.2 },
  stroke: { kind: 'number', quantity: 'length', label: 'Stroke', default: 0.1, min: 0.001, max: 3 },
  movingMass: { kind: 'number', quantity: 'mass', label: 'Moving mass (piston, rod, load)', default: 1, min: 0.001, max: 10_000 },
  load: { kind: 'number', quantity: 'force', label: 'External load against extension', default: 0, min: -100_000, max: 100_000 },
  coulombFriction: { kind: 'number', quantity: 'force', label: 'Sliding (Coulomb) friction', default: 15, min: 0, max: 10_000 },
  breakawayFriction: { kind: 'number', quantity: 'force', label: 'Breakaway friction', default: 25, min: 0, max: 10_000 },
  viscousFriction: { kind: 'number', quantity: 'damping', label: 'Viscous friction', default: 40, min: 0, max: 100_000 },
  deadVolumeCap: { kind: 'number', quantity: 'volume', label: 'Dead volume, cap end', default: 3e-6, min: 1e-8, max: 0.01 },
  deadVolumeRod: { kind: 'number', quantity: 'volume', label: 'Dead volume, rod end', default: 3e-6, min: 1e-8, max: 0.01 },
  portConductance: { kind: 'number', quantity: 'conductance', label: 'Port sonic conductance C', default: 2e-8, min: 1e-11, max: 1e-6 },
  startPosition: { kind: 'number', quantity: 'length', label: 'Start position from retracted', default: 0, min: 0, max: 3 },
  polytropicExponent: {
    kind: 'number',
    quantity: 'ratio',
    label: 'Polytropic exponent of the chamber air',
    default: 1,
    min: 1,
    max: 1.4,
    description: '1 = isothermal (slow strokes, good heat exchange); 1.4 = adiabatic (fast strokes); 1.2–1.3 is often used between.',
  },
};
