import { text } from './document-edits';
import { numberParameterFault } from './parameter-fault';

/**
 * Worn piston seal: air passes from the pressurised chamber to the other one (to the vented
 * spring side of a single-acting cylinder). Up to 2e-9 m³/(s·Pa), a tenth of the default port
 * conductance: enough to slow a stroke clearly and to hold the exhausting chamber up at the end.
 * The severity stays a conductance: turning it into an orifice diameter would need a discharge
 * coefficient we have no source for.
 */
export const pistonSealLeak = numberParameterFault({
  id: 'piston-seal-leak',
  label: 'Piston seal leaking',
  appliesTo: ['cylinder-double-acting', 'cylinder-single-acting'],
  parameter: 'pistonSealLeak',
  nominal: 0,
  range: () => ({ min: 0, max: 2e-9, unit: 'm³/(s·Pa)', label: 'Leak conductance', quantity: 'conductance' }),
  describe: (tag, c) => `${tag}: the piston seal leaks between the chambers (${text.conductance(c)}).`,
});
