import { manualContact } from './manual-contact';

export const emergencyStop = manualContact({
  id: 'emergency-stop',
  label: 'Emergency stop',
  description: 'Mushroom-head stop with a normally-closed contact that latches open when struck; twisting or pulling (toggle) resets it.',
  normallyClosed: true,
  operation: 'emergency-stop',
});
