import { switchTimeParam } from '../components/parameters';
import { text } from './document-edits';
import { numberParameterFault } from './parameter-fault';
import { directionalValve } from './valves';

/**
 * A sluggish spool (dirt, varnish, a swollen seal): it switches late. The severity is the
 * switching time on the machine, from the drawing's up to half a second (common practice:
 * a spool that takes longer is usually found stuck).
 */
export const spoolSticking = numberParameterFault({
  id: 'spool-sticking',
  label: 'Spool sticking (switches late)',
  appliesTo: directionalValve,
  parameter: 'switchTime',
  nominal: switchTimeParam.default as number,
  range: (nominal) => ({ min: nominal, max: Math.max(0.5, nominal), unit: 's', label: 'Switching time', quantity: 'time' }),
  describe: (tag, s) => `${tag}: the spool takes ${text.ms(s)} to switch.`,
});
