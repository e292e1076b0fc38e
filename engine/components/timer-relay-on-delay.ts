import { dropOutParam, pickUpParam } from './electrical-parameters';
import { relayCoilType } from './relay';

export const timerRelayOnDelay = relayCoilType({
  id: 'timer-relay-on-delay',
  label: 'Timer relay, on-delay',
  description: 'Its contacts switch a set time after the coil is energised and return at once when it is not.',
  pickUp: pickUpParam(1, 'Delay'),
  dropOut: dropOutParam(0),
});
