import { hasParameter } from './document-edits';
import { onOffParameterFault } from './parameter-fault';

/** A dead position switch or sensor: its output stays off whatever the piston does. */
export const sensorFailed = onOffParameterFault({
  id: 'sensor-failed',
  label: 'Sensor failed (never switches)',
  appliesTo: (component) => hasParameter(component, 'stuckAt'),
  parameter: 'stuckAt',
  healthy: 'none',
  failed: 'off',
  describe: (tag) => `${tag} has failed: its output never switches.`,
});
