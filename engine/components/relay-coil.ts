import { dropOutParam, pickUpParam } from './electrical-parameters';
import { relayCoilType } from './relay';

/** Typical small control relay: about 10 ms to pick up, 5 ms to drop out (from memory of catalogue data). */
export const relayCoil = relayCoilType({
  id: 'relay-coil',
  label: 'Relay coil',
  description: 'Control relay coil (A1–A2); its contacts are placed separately and name its tag.',
  pickUp: pickUpParam(0.01),
  dropOut: dropOutParam(0.005),
});
