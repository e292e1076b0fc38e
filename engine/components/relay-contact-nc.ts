import { relayContact } from './relay';

export const relayContactNc = relayContact({
  id: 'relay-contact-nc',
  label: 'Relay contact, normally closed',
  description: 'Opens while the named coil (relay, timer relay or counter) is operated.',
  normallyClosed: true,
});
