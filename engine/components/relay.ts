import { coilTagParam, switchedLoad, terminals } from './electrical-parameters';
import type { ComponentType, ParameterSpec } from './types';

/**
 * Coils whose contacts (relay-contact-no / relay-contact-nc components naming the
 * coil's tag) switch after a pick-up time once the coil is energised and return
 * after a drop-out time once it is not. A plain relay has short times of both; an
 * on-delay timer relay a set pick-up delay and none on drop-out; an off-delay timer
 * relay the reverse.
 */
export function relayCoilType(def: { id: string; label: string; description: string; pickUp: ParameterSpec; dropOut: ParameterSpec }): ComponentType {
  return {
    id: def.id,
    version: 1,
    label: def.label,
    category: 'electrical',
    description: def.description,
    ports: terminals('A1', 'A2'),
    parameters: { pickUpTime: def.pickUp, dropOutTime: def.dropOut },
    states: ['released', 'operated'],
    build(ctx) {
      const control = ctx.control();
      control.addLoad(ctx.terminal('A1'), ctx.terminal('A2'), ctx.componentId);
      const pickUp = ctx.num('pickUpTime');
      const dropOut = ctx.num('dropOutTime');
      const tag = ctx.tag;
      let energised = false;
      let operated = false;
      return {
        onInput(command, api) {
          const now = switchedLoad(command, energised);
          if (now === null) return;
          energised = now;
          api.event(energised ? 'energised' : 'de-energised');
          api.cancel('operate');
          if (energised !== operated) api.schedule(energised ? pickUp : dropOut, 'operate');
        },
        onTimer(_tag, api) {
          if (operated === energised) return;
          operated = energised;
          api.event(operated ? 'contacts-operated' : 'contacts-returned');
          control.operateContacts(tag, operated, api);
        },
        signals() {
          return { energised: energised ? 1 : 0, operated: operated ? 1 : 0 };
        },
      };
    },
  };
}

/** A relay contact bound to a coil by tag. */
export function relayContact(def: { id: string; label: string; description: string; normallyClosed: boolean }): ComponentType {
  const [a, b] = def.normallyClosed ? ['21', '22'] : ['13', '14'];
  return {
    id: def.id,
    version: 1,
    label: def.label,
    category: 'electrical',
    description: def.description,
    ports: terminals(a!, b!),
    parameters: {
      coil: coilTagParam,
    },
    states: ['open', 'closed'],
    build(ctx) {
      const control = ctx.control();
      const contact = control.addContact(ctx.terminal(a!), ctx.terminal(b!), def.normallyClosed, ctx.componentId, ctx.choice('coil'));
      return {
        signals() {
          return { closed: control.contactClosed(contact) ? 1 : 0 };
        },
      };
    },
  };
}
