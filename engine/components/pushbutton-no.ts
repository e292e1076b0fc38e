import { manualContact } from './manual-contact';

export const pushbuttonNo = manualContact({
  id: 'pushbutton-no',
  label: 'Push-button, normally open',
  description: 'Momentary push-button: its contact closes while pressed.',
  normallyClosed: false,
  operation: 'momentary',
});
