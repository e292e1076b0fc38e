import { text } from './document-edits';
import { numberParameterFault } from './parameter-fault';

/**
 * Supply pressure below the drawing's: a regulator turned down, an undersized compressor or
 * main. The severity is the set pressure on the machine, Pa gauge, from 2 bar up to the drawing's.
 */
export const supplyLow = numberParameterFault({
  id: 'supply-low',
  label: 'Supply pressure low',
  appliesTo: ['air-supply'],
  parameter: 'pressure',
  nominal: 600_000,
  range: (set) => ({ min: Math.min(200_000, set / 2), max: set, unit: 'Pa', label: 'Supply pressure, gauge', quantity: 'pressure-gauge' }),
  describe: (tag, pa) => `${tag} delivers only ${text.barGauge(pa)}.`,
});
