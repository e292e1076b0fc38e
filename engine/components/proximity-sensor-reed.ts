import { positionSwitch } from './position-switch';

/**
 * Magnetic (reed) cylinder sensor on the barrel, detecting the piston magnet. A reed
 * sensor's switching range along the stroke is some millimetres with a millimetre or
 * two of hysteresis (from memory of typical data sheets).
 */
export const proximitySensorReed = positionSwitch({
  id: 'proximity-sensor-reed',
  label: 'Cylinder sensor, magnetic (reed)',
  description: 'Three-wire sensor on the cylinder barrel: BK switches to BN while the piston magnet is within its window.',
  kind: 'sensor',
  windowM: 0.004,
  hysteresisM: 0.0015,
});
