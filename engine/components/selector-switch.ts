import { manualContact } from './manual-contact';

export const selectorSwitch = manualContact({
  id: 'selector-switch',
  label: 'Selector switch, latching',
  description: 'Two-position switch that stays where it is put: each press or toggle changes it.',
  normallyClosed: false,
  operation: 'latching',
});
