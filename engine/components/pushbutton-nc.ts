import { manualContact } from './manual-contact';

export const pushbuttonNc = manualContact({
  id: 'pushbutton-nc',
  label: 'Push-button, normally closed',
  description: 'Momentary push-button: its contact opens while pressed (a stop button).',
  normallyClosed: true,
  operation: 'momentary',
});
