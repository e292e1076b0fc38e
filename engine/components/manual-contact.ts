import { terminals } from './electrical-parameters';
import type { ComponentType, HandOperation, InputCommand } from './types';

type Operation = 'momentary' | 'latching' | 'emergency-stop';

const BY_HAND: Readonly<Record<Operation, HandOperation>> = { momentary: 'hold', latching: 'switch', 'emergency-stop': 'strike' };

/**
 * Hand-operated contacts: a momentary push-button (NO or NC), a latching selector switch,
 * and an emergency stop (NC, latches open when struck, reset by twisting or pulling).
 */
export function manualContact(def: { id: string; label: string; description: string; normallyClosed: boolean; operation: Operation }): ComponentType {
  const [a, b] = def.normallyClosed ? ['11', '12'] : ['13', '14'];
  return {
    id: def.id,
    version: 1,
    label: def.label,
    category: 'electrical',
    description: def.description,
    ports: terminals(a!, b!),
    parameters: {},
    states: def.operation === 'emergency-stop' ? ['ready', 'struck'] : ['released', 'operated'],
    inputs: def.operation === 'emergency-stop' ? ['press', 'toggle', 'set'] : ['press', 'release', 'toggle', 'set'],
    handOperation: () => BY_HAND[def.operation],
    build(ctx) {
      const control = ctx.control();
      const contact = control.addContact(ctx.terminal(a!), ctx.terminal(b!), def.normallyClosed, ctx.componentId);
      let operated = false;
      const next = (command: InputCommand): boolean => {
        if (command.action === 'set') return (command.value ?? 0) > 0;
        if (def.operation === 'momentary') return command.action === 'toggle' ? !operated : command.action === 'press';
        // Emergency stop: pressing strikes it, only a twist or pull (toggle) resets it.
        if (def.operation === 'emergency-stop') return command.action === 'press' ? true : command.action === 'toggle' ? false : operated;
        return command.action === 'release' ? operated : !operated;
      };
      return {
        onInput(command, api) {
          const now = next(command);
          if (now === operated) return;
          operated = now;
          if (def.operation === 'emergency-stop') api.event(operated ? 'struck' : 'reset');
          control.setContacts([[contact, def.normallyClosed ? !operated : operated]], api);
        },
        signals() {
          return { operated: operated ? 1 : 0, closed: control.contactClosed(contact) ? 1 : 0 };
        },
      };
    },
  };
}
