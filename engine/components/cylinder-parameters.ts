import type { BuildContext, NodeRef, ParameterSpec } from './types';

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

/**
 * A worn seal as a leak passage, ISO 6358 sonic conductance C; 0 (the default) means a sound
 * seal and builds no passage at all, so a healthy cylinder runs exactly as before.
 */
const sealLeakParam = (label: string, description: string): ParameterSpec => ({
  kind: 'number',
  quantity: 'conductance',
  label,
  default: 0,
  min: 0,
  max: 1e-7,
  description,
});

export const pistonSealLeakParam = sealLeakParam('Piston seal leak C (0 = sound)', 'Leak past the piston seal from one chamber to the other (to the vented side of a single-acting cylinder).');
export const rodSealLeakParam = sealLeakParam('Rod seal leak C (0 = sound)', 'Leak past the rod seal from the rod-end chamber to atmosphere.');

/**
 * Builds a seal leak between two nodes when its parameter is above zero. A leak is a short,
 * irregular gap rather than a sized orifice, so the critical ratio is taken as 0.5 (common practice
 * for an unknown passage; the leak's conductance matters far more than its b).
 */
export function sealLeak(ctx: BuildContext, parameter: string, from: NodeRef, to: NodeRef): void {
  const conductance = ctx.num(parameter);
  if (conductance > 0) ctx.restriction({ name: parameter, from, to, conductance, criticalRatio: 0.5 });
}
