import { text } from './document-edits';
import { numberParameterFault } from './parameter-fault';

/** Worn rod seal: the rod-end chamber leaks to atmosphere (range as for the piston seal). */
export const rodSealLeak = numberParameterFault({
  id: 'rod-seal-leak',
  label: 'Rod seal leaking',
  appliesTo: ['cylinder-double-acting'],
  parameter: 'rodSealLeak',
  nominal: 0,
  range: () => ({ min: 0, max: 2e-9, unit: 'm³/(s·Pa)', label: 'Leak conductance', quantity: 'conductance' }),
  describe: (tag, c) => `${tag}: the rod seal leaks to atmosphere (${text.conductance(c)}).`,
});
