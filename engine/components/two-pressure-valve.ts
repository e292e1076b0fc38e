import { defineLogicValve } from './logic-valve';

/** Two-pressure valve (AND): the output carries the lower of the two input pressures. */
export const twoPressureValve = defineLogicValve({
  id: 'two-pressure-valve',
  label: 'Two-pressure valve (AND)',
  description: 'Passes air to 2 only when both inputs 1 are pressurised; the lower input pressure reaches the output.',
  passes: 'lower',
});
