import { relayContact } from './relay';

export const relayContactNo = relayContact({
  id: 'relay-contact-no',
  label: 'Relay contact, normally open',
  description: 'Closes while the named coil (relay, timer relay or counter) is operated.',
  normallyClosed: false,
});
