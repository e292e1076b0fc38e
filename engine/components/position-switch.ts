import { hysteresisParam, stuckInput, terminals, windowParam, type StuckState } from './electrical-parameters';
import type { ComponentType, ParameterSpec, RuntimeApi } from './types';

/** Set on a sensor suspected of having failed: its output no longer follows the piston. */
const stuckAtParam: ParameterSpec = {
  kind: 'choice',
  label: 'Output stuck',
  options: ['none', 'off', 'on'],
  default: 'none',
  description: 'A failure to look into: the output stays off (or on) whatever the piston does.',
};

/**
 * A switch actuated by a cylinder at a stroke position (an actuation link from the
 * cylinder gives the position): actuated while the piston is within the window of
 * that position, released once it is further than window + hysteresis away.
 * A mechanical limit switch has a changeover contact (11 common, 12 NC, 14 NO);
 * a three-wire sensor closes its output BK to its + lead BN while it detects.
 * A failure can be given as an input: `set` `stuck` 1 (stuck on), 0 (stuck off), -1 (working again),
 * or from the start by the `stuckAt` parameter (a failed sensor to look into).
 */
export function positionSwitch(def: { id: string; label: string; description: string; kind: 'changeover' | 'sensor'; windowM: number; hysteresisM: number }): ComponentType {
  return {
    id: def.id,
    version: 1,
    label: def.label,
    category: 'electrical',
    description: def.description,
    ports: def.kind === 'changeover' ? terminals('11', '12', '14') : [...terminals('BN', 'BK'), { id: 'BU', role: 'terminal', label: 'BU (0 V)' }],
    parameters: { window: windowParam(def.windowM), hysteresis: hysteresisParam(def.hysteresisM), stuckAt: stuckAtParam },
    states: ['released', 'actuated'],
    inputs: ['set'],
    build(ctx) {
      const control = ctx.control();
      const links = ctx.actuationLinks();
      const window = ctx.num('window');
      const hysteresis = ctx.num('hysteresis');
      const contacts =
        def.kind === 'changeover'
          ? [control.addContact(ctx.terminal('11'), ctx.terminal('12'), true, ctx.componentId), control.addContact(ctx.terminal('11'), ctx.terminal('14'), false, ctx.componentId)]
          : [control.addContact(ctx.terminal('BN'), ctx.terminal('BK'), false, ctx.componentId)];
      // What the position calls for, kept apart from the output so that a stuck switch still tracks its hysteresis.
      let sensed = false;
      const stuckAt = ctx.choice('stuckAt');
      let stuck: StuckState = stuckAt === 'none' ? null : stuckAt === 'on';
      let actuated = false;
      const reach = () => (sensed ? window + hysteresis : window);
      const apply = (api: RuntimeApi, now: boolean) => {
        sensed = now;
        const output = stuck ?? sensed;
        if (output === actuated) return;
        actuated = output;
        api.event(actuated ? 'actuated' : 'released');
        control.setContacts(def.kind === 'changeover' ? [[contacts[0]!, !actuated], [contacts[1]!, actuated]] : [[contacts[0]!, actuated]], api);
      };
      const inside = (api: RuntimeApi) => links.some((l) => Math.abs(api.position(l.piston) - l.positionM) <= reach());
      const guardValues = new Array<number>(2 * links.length).fill(0);
      return {
        guards(api) {
          links.forEach((l, i) => {
            const x = api.position(l.piston);
            guardValues[2 * i] = x - (l.positionM - reach());
            guardValues[2 * i + 1] = l.positionM + reach() - x;
          });
          return guardValues;
        },
        onGuard(_index, _rising, api) {
          apply(api, inside(api));
        },
        start(api) {
          apply(api, inside(api));
        },
        onInput(command, api) {
          const next = stuckInput(command, api);
          if (next === undefined) return;
          stuck = next;
          apply(api, sensed);
        },
        signals() {
          return { actuated: actuated ? 1 : 0 };
        },
      };
    },
  };
}
