import type { CircuitComponent, CircuitDocument } from '../../document/schema';
import { componentTypeById } from '../../components/registry';
import { componentClass, isHandValve, parametersOf } from './vocabulary';

export interface RuleTemplate {
  id: string;
  title: string;
  /** The practice or standard the rule comes from, e.g. 'ISO 13851 two-hand control'. */
  basis: string;
  /** Ready rules text using the drawing's tags. */
  text: string;
}

/** Synchronous actuation of a two-hand control device: both hands within 0.5 s (ISO 13851, type III). */
const SYNCHRONOUS_S = 0.5;
/** Allowance from both buttons pressed to the cylinder moving (valve switching and pressure build-up), s (common practice; editable). */
const RESPONSE_S = 0.3;
/** Supply pressure below which the supply counts as lost, bar gauge (editable default). */
const SUPPLY_LOST_BAR = 0.5;
/** Time a stroke under way may run on after the air is lost, s (editable default). */
const COAST_S = 0.5;
/** Default stroke watchdog, s (editable default). */
const WATCHDOG_S = 2;

interface Part {
  component: CircuitComponent;
  kind: string;
}

/**
 * Rules from safety practice that fit the drawing, written with its tags. Only templates whose
 * parts exist are offered. The texts are starting points for an engineer to edit, not a
 * substitute for the risk assessment that decides which rules a machine needs.
 */
export function ruleTemplates(document: CircuitDocument): RuleTemplate[] {
  const parts: Part[] = [];
  for (const component of document.components) {
    const type = componentTypeById(component.type);
    if (!type) continue;
    const cls = componentClass(type);
    const kind = cls === 'button' && component.type !== 'pushbutton-no' ? 'other' : cls === 'valve' && isHandValve(component, type) && type.handOperation?.(parametersOf(component, type)) === 'hold' ? 'button' : cls;
    parts.push({ component, kind: component.type === 'air-supply' ? 'supply' : component.type === 'dc-supply' ? 'dc' : kind });
  }
  const of = (kind: string) => parts.filter((p) => p.kind === kind).map((p) => p.component);
  const cylinders = of('cylinder');
  const buttons = of('button');
  const templates: RuleTemplate[] = [];

  if (cylinders.length > 0 && buttons.length >= 2) {
    const cyl = cylinders[0]!.tag;
    const [a, b] = [buttons[0]!.tag, buttons[1]!.tag];
    templates.push({
      id: `two-hand-${cyl}`,
      title: `Two-hand control of ${cyl} (ISO 13851)`,
      basis: 'ISO 13851 two-hand control',
      text: [
        `# Both hands within ${SYNCHRONOUS_S} s of each other (ISO 13851 synchronous actuation); ${RESPONSE_S} s allows for the valves to switch (editable).`,
        `rule "${cyl} moves out only on a two-hand start (ISO 13851)":`,
        `  ${cyl} is extending only after together within ${SYNCHRONOUS_S} s (${a} is pressed, ${b} is pressed) within ${RESPONSE_S} s`,
        `# Letting go of either button must stop the stroke within ${RESPONSE_S} s.`,
        `rule "${cyl} stops when a hand lets go (ISO 13851)":`,
        `  always (${cyl} is extending implies once within ${RESPONSE_S} s (${a} is pressed and ${b} is pressed))`,
      ].join('\n'),
    });
  }

  const supplies = of('supply');
  if (supplies.length > 0 && cylinders.length > 0) {
    const supply = supplies[0]!.tag;
    templates.push({
      id: 'loss-of-air',
      title: 'No movement out on loss of supply air (ISO 4414)',
      basis: 'ISO 4414 general rules: a loss of energy must not create a hazard',
      text: [
        `# Once the supply ${supply} has been below ${SUPPLY_LOST_BAR} bar (air lost) for ${COAST_S} s, no cylinder may move out, by its load or by trapped air;`,
        `# the ${COAST_S} s let a stroke under way run down. Simulate it with the input set pressure 0 on ${supply}.`,
        ...cylinders.flatMap((c) => [
          `rule "${c.tag} does not move out without supply air (ISO 4414)":`,
          `  always ((historically within ${COAST_S} s pressure at ${supply}.2 < ${SUPPLY_LOST_BAR} bar) implies not ${c.tag} is extending)`,
        ]),
      ].join('\n'),
    });
  }

  const coils = of('coil').filter((c) => c.type === 'solenoid-coil');
  const valves = of('valve');
  if (of('dc').length > 0 && coils.length > 0) {
    const lines: string[] = [
      '# A loss of control power switches every coil off. A spring-return solenoid valve must then be back in its normal position,',
      '# and a cylinder may start moving out only while a solenoid is energised, so that power coming back cannot start a stroke by itself.',
      `# Simulate it with the input set power 0 on ${of('dc')[0]!.tag}.`,
    ];
    for (const valve of valves) {
      const own = coils.filter((c) => String(parametersOf(c, componentTypeById(c.type)!).valve) === valve.tag);
      const params = parametersOf(valve, componentTypeById(valve.type)!);
      if (own.length === 0 || params.returnBy !== 'spring') continue;
      const settle = Math.max(0.2, 2 * Number(params.switchTime));
      const off = own.map((c) => `not ${c.tag} is on`).join(' and ');
      lines.push(`rule "${valve.tag} returns to its normal position when its coils are off (ISO 4414)":`, `  always ((historically within ${settle} s (${off})) implies not ${valve.tag} is switched)`);
    }
    const anyCoil = coils.map((c) => `${c.tag} is on`).join(' or ');
    for (const c of cylinders) lines.push(`rule "${c.tag} starts out only with a solenoid energised (ISO 4414, IEC 60204-1)":`, `  ${c.tag} is extending only after (${anyCoil}) within 0.5 s`);
    templates.push({ id: 'loss-of-power', title: 'Safe state on loss of control power (ISO 4414, IEC 60204-1)', basis: 'ISO 4414 and IEC 60204-1: a loss of power must not create a hazard', text: lines.join('\n') });
  }

  const sides = new Map<string, Map<string, string>>();
  for (const c of coils) {
    const p = parametersOf(c, componentTypeById(c.type)!);
    const bySide = sides.get(String(p.valve)) ?? new Map<string, string>();
    if (!bySide.has(String(p.side))) bySide.set(String(p.side), c.tag);
    sides.set(String(p.valve), bySide);
  }
  for (const [valve, bySide] of sides) {
    if (bySide.size < 2) continue;
    const [m14, m12] = [bySide.get('14')!, bySide.get('12')!];
    templates.push({
      id: `exclusive-solenoids-${valve}`,
      title: `${valve} never has both solenoids energised`,
      basis: 'double-solenoid valve interlock (common practice)',
      text: [`# Both solenoids on at once leave the valve where it was: the control must never ask for both.`, `rule "${valve} never has both solenoids energised":`, `  exclusive (${m14} is on, ${m12} is on)`].join('\n'),
    });
  }

  if (cylinders.length > 0) {
    templates.push({
      id: 'stroke-watchdog',
      title: `Stroke time watchdog (${WATCHDOG_S} s)`,
      basis: 'cycle-time monitoring (common practice)',
      text: [
        `# A stroke that does not reach its end within ${WATCHDOG_S} s points to a jam, a leak or low pressure; ${WATCHDOG_S} s is an editable default.`,
        ...cylinders.flatMap((c) => [
          `rule "${c.tag} reaches its end within ${WATCHDOG_S} s of moving out":`,
          `  always (${c.tag} is extending implies eventually within ${WATCHDOG_S} s ${c.tag} is extended)`,
          `rule "${c.tag} reaches its end within ${WATCHDOG_S} s of moving in":`,
          `  always (${c.tag} is retracting implies eventually within ${WATCHDOG_S} s ${c.tag} is retracted)`,
        ]),
      ].join('\n'),
    });
  }
  return templates;
}
