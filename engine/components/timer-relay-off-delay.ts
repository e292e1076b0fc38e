import { dropOutParam, pickUpParam } from './electrical-parameters';
import { relayCoilType } from './relay';

export const timerRelayOffDelay = relayCoilType({
  id: 'timer-relay-off-delay',
  label: 'Timer relay, off-delay',
  description: 'Its contacts switch at once when the coil is energised and return a set time after it is not.',
  pickUp: pickUpParam(0),
  dropOut: dropOutParam(1, 'Delay'),
});
