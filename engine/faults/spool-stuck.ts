import { onOffParameterFault } from './parameter-fault';
import { directionalValve } from './valves';

/** A spool seized in its rest position: the valve ignores every actuation. */
export const spoolStuck = onOffParameterFault({
  id: 'spool-stuck',
  label: 'Spool stuck in rest position',
  appliesTo: directionalValve,
  parameter: 'stuck',
  healthy: false,
  failed: true,
  describe: (tag) => `${tag}: the spool is stuck in its rest position and does not switch.`,
});
