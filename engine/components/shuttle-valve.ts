import { defineLogicValve } from './logic-valve';

/** Shuttle valve (OR): the output carries the higher of the two input pressures. */
export const shuttleValve = defineLogicValve({
  id: 'shuttle-valve',
  label: 'Shuttle valve (OR)',
  description: 'Passes air to 2 from whichever input 1 has the higher pressure; with equal pressures the first one stays connected.',
  passes: 'higher',
});
