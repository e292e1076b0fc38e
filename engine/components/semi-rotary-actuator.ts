import type { ComponentType } from './types';

/**
 * Semi-rotary (vane) actuator. It reuses the piston model with angle in place
 * of position: "area" is the displacement per radian (m³/rad), the moving mass
 * is the moment of inertia (kg·m²), forces are torques (N·m).
 */
export const semiRotaryActuator: ComponentType = {
  id: 'semi-rotary-actuator',
  version: 1,
  label: 'Semi-rotary actuator',
  category: 'actuator',
  description: 'Turns through its swivel angle on air to A, back on air to B.',
  ports: [
    { id: 'A', role: 'working' },
    { id: 'B', role: 'working' },
  ],
  parameters: {
    displacement: { kind: 'number', quantity: 'volume-per-angle', label: 'Displacement per radian', default: 5e-6, min: 1e-8, max: 0.01 },
    swivelAngle: { kind: 'number', quantity: 'angle', label: 'Swivel angle', default: Math.PI / 2, min: 0.05, max: 2 * Math.PI },
    inertia: { kind: 'number', quantity: 'inertia', label: 'Moment of inertia', default: 2e-4, min: 1e-7, max: 100 },
    loadTorque: { kind: 'number', quantity: 'torque', label: 'Load torque', default: 0, min: -1000, max: 1000 },
    frictionTorque: { kind: 'number', quantity: 'torque', label: 'Friction torque', default: 0.2, min: 0, max: 100 },
    deadVolume: { kind: 'number', quantity: 'volume', label: 'Dead volume per side', default: 2e-6, min: 1e-8, max: 0.01 },
    portConductance: { kind: 'number', quantity: 'conductance', label: 'Port sonic conductance C', default: 1e-8, min: 1e-11, max: 1e-6 },
  },
  states: ['start', 'turning', 'end'],
  build(ctx) {
    const a = ctx.internalNode('chamber-A', 0);
    const b = ctx.internalNode('chamber-B', 0);
    ctx.restriction({ name: 'port-A', from: ctx.port('A'), to: a, conductance: ctx.num('portConductance'), criticalRatio: 0.3 });
    ctx.restriction({ name: 'port-B', from: ctx.port('B'), to: b, conductance: ctx.num('portConductance'), criticalRatio: 0.3 });
    const friction = ctx.num('frictionTorque');
    ctx.piston({
      name: 'vane',
      capNode: a,
      capArea: ctx.num('displacement'),
      rodNode: b,
      rodSideArea: ctx.num('displacement'),
      ambientArea: 0,
      strokeM: ctx.num('swivelAngle'),
      deadVolumeCapM3: ctx.num('deadVolume'),
      deadVolumeRodM3: ctx.num('deadVolume'),
      movingMassKg: ctx.num('inertia'),
      loadN: ctx.num('loadTorque'),
      coulombN: friction,
      breakawayN: friction * 1.5,
      viscousNsPerM: 0.01,
      springPreloadN: 0,
      springRateNPerM: 0,
      startPositionM: 0,
    });
    return {};
  },
};
