import { openingParam } from '../components/throttle';
import { text } from './document-edits';
import { numberParameterFault } from './parameter-fault';

/** A throttle or one-way flow control turned to another opening than the drawing's. */
export const throttleSetting = numberParameterFault({
  id: 'throttle-setting',
  label: 'Throttle set differently',
  appliesTo: ['throttle', 'one-way-flow-control'],
  parameter: 'opening',
  nominal: openingParam.default as number,
  range: () => ({ min: 0, max: 1, unit: '1', label: 'Opening as set', quantity: 'fraction' }),
  describe: (tag, opening) => `${tag} is set to ${text.percent(opening)} open.`,
});
