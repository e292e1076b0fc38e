import { portVolumeParam } from './parameters';
import type { ComponentType } from './types';

/** Air reservoir: a volume on its port. */
export const reservoir: ComponentType = {
  id: 'reservoir',
  version: 1,
  label: 'Reservoir',
  category: 'supply',
  description: 'A rigid volume that stores air where it is connected.',
  ports: [{ id: '1', role: 'working' }],
  parameters: { volume: portVolumeParam('Volume', 0.001) },
  states: [],
  build(ctx) {
    ctx.addVolume(ctx.port('1'), ctx.num('volume'));
    return {};
  },
};
