import { positionSwitch } from './position-switch';

/**
 * Inductive proximity sensor sensing a steel target on the moving part: a narrower
 * window and smaller hysteresis than a reed sensor (from memory of typical data sheets).
 */
export const proximitySensorInductive = positionSwitch({
  id: 'proximity-sensor-inductive',
  label: 'Proximity sensor, inductive',
  description: 'Three-wire PNP sensor: BK switches to BN while the target on the piston rod is within its window.',
  kind: 'sensor',
  windowM: 0.0015,
  hysteresisM: 0.0003,
});
