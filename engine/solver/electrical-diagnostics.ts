import { parameterDefaults, type ComponentType } from '../components/types';
import type { CircuitDocument } from '../document/schema';
import type { Diagnostic } from './model';

/** Types whose coil operates contacts named by its tag. */
const CONTACT_COILS = new Set(['relay-coil', 'timer-relay-on-delay', 'timer-relay-off-delay', 'counter']);
const CONTACTS = new Set(['relay-contact-no', 'relay-contact-nc']);

/**
 * The control circuit's mistakes found before running: a solenoid coil that drives no
 * solenoid, a contact whose coil does not exist, two coils answering to one tag, a
 * solenoid with no coil, and + wired straight to 0 V. User mistakes, so diagnostics.
 */
export function electricalDiagnostics(document: CircuitDocument, types: ReadonlyMap<string, ComponentType>, netOf: (component: string, terminal: string) => number): Diagnostic[] {
  const out: Diagnostic[] = [];
  const placed = document.components.flatMap((c) => {
    const type = types.get(c.id);
    return type ? [{ c, type, params: { ...parameterDefaults(type), ...c.parameters } }] : [];
  });
  const byTag = new Map<string, typeof placed>();
  for (const p of placed) byTag.set(p.c.tag, [...(byTag.get(p.c.tag) ?? []), p]);

  // Which valve sides carry a solenoid: side 14 when actuated by solenoid, side 12 when it returns by one
  // (or, on a three-position valve, when both sides are actuated alike).
  const solenoidSides = (p: (typeof placed)[number]): string[] => {
    if (!('actuation' in p.type.parameters)) return [];
    const a = p.params.actuation === 'solenoid';
    const b = p.type.states.length === 3 ? a : p.params.returnBy === 'solenoid';
    return [...(a ? ['14'] : []), ...(b ? ['12'] : [])];
  };

  const driven = new Map<string, string>();
  for (const p of placed) {
    if (p.type.id === 'solenoid-coil') {
      const valveTag = String(p.params.valve);
      const side = String(p.params.side);
      const valve = byTag.get(valveTag)?.find((v) => solenoidSides(v).length > 0);
      if (!valve || !solenoidSides(valve).includes(side)) {
        out.push({
          code: 'coil-without-valve',
          severity: 'warning',
          message: valve ? `${p.c.tag}: valve ${valveTag} has no solenoid on side ${side}` : `${p.c.tag}: no solenoid valve is tagged ${valveTag}`,
          componentId: p.c.id,
        });
        continue;
      }
      const at = `${valve.c.id}\u0000${side}`;
      if (driven.has(at)) {
        out.push({ code: 'duplicate-coil', severity: 'error', message: `${p.c.tag} and ${driven.get(at)} both drive side ${side} of ${valveTag}`, componentId: p.c.id });
      }
      driven.set(at, p.c.tag);
    }
    if (CONTACTS.has(p.type.id)) {
      const coilTag = String(p.params.coil);
      if (!byTag.get(coilTag)?.some((x) => CONTACT_COILS.has(x.type.id))) {
        out.push({ code: 'contact-without-coil', severity: 'warning', message: `${p.c.tag}: no relay, timer relay or counter is tagged ${coilTag}, so this contact never switches`, componentId: p.c.id });
      }
    }
  }
  for (const p of placed) {
    for (const side of solenoidSides(p)) {
      if (!driven.has(`${p.c.id}\u0000${side}`)) {
        out.push({ code: 'solenoid-without-coil', severity: 'warning', message: `${p.c.tag}: the solenoid on side ${side} has no coil in the control circuit`, componentId: p.c.id });
      }
    }
  }
  for (const [tag, group] of byTag) {
    const coils = group.filter((x) => CONTACT_COILS.has(x.type.id) || x.type.id === 'solenoid-coil');
    if (coils.length > 1) out.push({ code: 'duplicate-coil-tag', severity: 'error', message: `${coils.length} coils are tagged ${tag}`, componentId: coils[1]!.c.id });
  }
  const supplies = placed.filter((p) => p.type.id === 'dc-supply');
  const zeroNets = new Set(supplies.map((p) => netOf(p.c.id, 'M')));
  for (const p of supplies) {
    if (zeroNets.has(netOf(p.c.id, 'L+'))) out.push({ code: 'short-circuit', severity: 'error', message: `${p.c.tag}: + is wired straight to 0 V`, componentId: p.c.id });
  }
  return out;
}
