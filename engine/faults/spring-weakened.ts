import { text } from './document-edits';
import { scaledParametersFault } from './parameter-fault';

/**
 * A tired or broken-in return spring of a single-acting cylinder: preload and rate both drop
 * to a fraction of the drawing's. Valve return springs are not offered: the valve model has
 * no spring force, only a switching time (a slow return shows as a sticking spool).
 */
export const springWeakened = scaledParametersFault({
  id: 'spring-weakened',
  label: 'Return spring weakened',
  appliesTo: ['cylinder-single-acting'],
  parameters: ['springPreload', 'springRate'],
  min: 0.2,
  describe: (tag, fraction) => `${tag}: the return spring has ${text.percent(fraction)} of its force left.`,
});
