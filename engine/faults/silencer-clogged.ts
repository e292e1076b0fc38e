import { text } from './document-edits';
import { scaledParametersFault } from './parameter-fault';

/** A silencer choked with oil mist and dirt: its conductance drops to a fraction of the drawing's. */
export const silencerClogged = scaledParametersFault({
  id: 'silencer-clogged',
  label: 'Silencer clogged',
  appliesTo: ['silencer'],
  parameters: ['conductance'],
  min: 0.05,
  describe: (tag, fraction) => `${tag} is clogged: ${text.percent(fraction)} of its flow capacity is left.`,
});
