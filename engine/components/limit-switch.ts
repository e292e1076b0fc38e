import { positionSwitch } from './position-switch';

/** Mechanical limit switch worked by a cam on the piston rod; window and hysteresis from memory of typical roller switches. */
export const limitSwitch = positionSwitch({
  id: 'limit-switch',
  label: 'Limit switch',
  description: 'Mechanically actuated changeover contact, worked by a cylinder at a stroke position.',
  kind: 'changeover',
  windowM: 0.002,
  hysteresisM: 0.0005,
});
