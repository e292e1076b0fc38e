import type { CircuitComponent, CircuitDocument } from '../../document/schema';
import { componentTypeById } from '../../components/registry';
import type { ComponentType } from '../../components/types';
import type { Atom, BoundAtom, BoundFormula, BoundRule, Formula, ParsedRule, RuleError, Span } from './ast';
import { parseRules } from './parser';
import { airPorts, componentClass, END_TOLERANCE_M, END_TOLERANCE_RAD, MOVING_SPEED_M_PER_S, PRESSURE_TOLERANCE_PA, stateWords, TURNING_RATE_RAD_PER_S } from './vocabulary';

/** Pa per bar (ISO 80000-4). */
const PA_PER_BAR = 100_000;
const RAD_PER_DEG = Math.PI / 180;

class BindProblem extends Error {
  constructor(
    message: string,
    readonly at: Span,
  ) {
    super(message);
  }
}

/**
 * Resolves every atom of the rules against a drawing: tags to components, state words and
 * measures to tests on trace signals (SI), pressures to gauge via the document's ambient
 * pressure. Each rule reports its first problem; the others are still bound.
 */
export function bindRules(rules: readonly ParsedRule[], document: CircuitDocument): { rules: BoundRule[]; errors: RuleError[] } {
  const byTag = new Map(document.components.map((c) => [c.tag, c]));
  const ambientPa = document.settings?.ambientPressurePa ?? 101_325;
  const tubed = new Set(document.tubes.flatMap((t) => [`${t.from.component}\u0000${t.from.port}`, `${t.to.component}\u0000${t.to.port}`]));
  const bound: BoundRule[] = [];
  const errors: RuleError[] = [];
  for (const rule of rules) {
    const signals = new Set<string>();
    const tags: string[] = [];
    const lookup = (tag: string, at: Span): { component: CircuitComponent; type: ComponentType } => {
      const component = byTag.get(tag);
      if (!component) throw new BindProblem(unknownTag(tag, [...byTag.keys()]), at);
      const type = componentTypeById(component.type);
      if (!type) throw new BindProblem(`'${tag}' is of type '${component.type}', which this version does not know`, at);
      if (!tags.includes(tag)) tags.push(tag);
      return { component, type };
    };
    const bindAtom = (atom: Atom): BoundAtom => {
      const read = (component: CircuitComponent, quantity: string) => {
        const name = `${component.id}:${quantity}`;
        signals.add(name);
        return name;
      };
      if (atom.kind === 'state') {
        const { component, type } = lookup(atom.tag, atom.tagAt);
        const words = stateWords(component, type);
        const test = words.get(atom.word);
        if (!test) {
          // Reported at the tag, as every binding problem of a part is: the editor marks the part, the message names the word.
          const valid = [...words.keys()];
          throw new BindProblem(
            valid.length === 0
              ? `'${atom.tag}' (${type.label.toLowerCase()}) has no states a rule can name; found 'is ${atom.word}'`
              : `'${atom.tag}' is ${article(type.label)}: after 'is' write ${choices(valid)}; found '${atom.word}'`,
            atom.tagAt,
          );
        }
        const { quantity, ...rest } = test;
        const bound: BoundAtom = { signal: read(component, quantity), constant: 0, ...rest };
        return atom.negated ? negate(bound) : bound;
      }
      if (atom.kind === 'measure') {
        const { component, type } = lookup(atom.tag, atom.tagAt);
        const kind = componentClass(type);
        const expected = measureUnit(kind, atom.quantity);
        if (!expected) {
          const has = kind === 'cylinder' ? "'position' and 'speed'" : kind === 'rotary' ? "'angle' and 'speed'" : null;
          throw new BindProblem(`'${atom.tag}' is ${article(type.label)}: it has no ${atom.quantity}${has ? `; use ${has}` : ' (position and speed apply to cylinders, angle and speed to semi-rotary actuators)'}`, atom.tagAt);
        }
        if (atom.unit !== expected) throw new BindProblem(`expected the unit ${expected} for the ${atom.quantity} of '${atom.tag}', found '${atom.unit}'`, atom.unitAt);
        const scale = expected === 'mm' || expected === 'mm/s' ? 0.001 : RAD_PER_DEG;
        const tolerance = atom.quantity === 'position' ? END_TOLERANCE_M : atom.quantity === 'angle' ? END_TOLERANCE_RAD : kind === 'rotary' ? TURNING_RATE_RAD_PER_S : MOVING_SPEED_M_PER_S;
        const speed = atom.quantity === 'speed';
        return { signal: read(component, speed ? 'v' : 'x'), constant: 0, magnitude: speed, cmp: atom.cmp, threshold: atom.value * scale, tolerance };
      }
      const { tag, port } = splitTarget(atom.target, byTag, atom.targetAt);
      const { component, type } = lookup(tag, atom.targetAt);
      const ports = airPorts(type);
      if (!ports.includes(port)) {
        throw new BindProblem(
          ports.length === 0 ? `'${tag}' has no air ports, so it has no pressure` : `'${tag}' has no air port '${port}'; its ports are ${choices(ports)}`,
          atom.targetAt,
        );
      }
      if (atom.unit !== 'bar') throw new BindProblem(`expected the unit bar (gauge) for a pressure, found '${atom.unit}'`, atom.unitAt);
      const role = type.ports.find((p) => p.id === port)!.role;
      // An exhaust port with nothing fitted vents to atmosphere: the trace has no column for it.
      const vented = role === 'exhaust' && !tubed.has(`${component.id}\u0000${port}`);
      const signal = vented ? null : read(component, `p:${port}`);
      return { signal, constant: ambientPa, magnitude: false, cmp: atom.cmp, threshold: ambientPa + atom.value * PA_PER_BAR, tolerance: PRESSURE_TOLERANCE_PA };
    };
    try {
      const formula = mapAtoms(rule.formula, bindAtom);
      bound.push({ name: rule.name, line: rule.line, formula, signals: [...signals], tags });
    } catch (e) {
      if (!(e instanceof BindProblem)) throw e;
      errors.push({ line: e.at.line, column: e.at.column, message: e.message });
    }
  }
  return { rules: bound, errors };
}

/** Parses and binds in one go; the errors of both, in text order. */
export function compileRulesText(text: string, document: CircuitDocument): { rules: BoundRule[]; errors: RuleError[] } {
  const parsed = parseRules(text);
  const bound = bindRules(parsed.rules, document);
  const errors = [...parsed.errors, ...bound.errors].sort((a, b) => a.line - b.line || a.column - b.column);
  return { rules: bound.rules, errors };
}

function mapAtoms(f: Formula, bind: (atom: Atom) => BoundAtom): BoundFormula {
  const m = (g: Formula) => mapAtoms(g, bind);
  const base = { text: f.text, at: f.at };
  switch (f.op) {
    case 'atom':
      return { ...base, op: 'atom', atom: bind(f.atom) };
    case 'not':
    case 'always':
    case 'never':
      return { ...base, op: f.op, arg: m(f.arg) };
    case 'eventually':
      return { ...base, op: 'eventually', windowS: f.windowS, arg: m(f.arg) };
    case 'once':
    case 'historically':
      return { ...base, op: f.op, windowS: f.windowS, arg: m(f.arg) };
    case 'and':
    case 'or':
    case 'implies':
    case 'until':
      return { ...base, op: f.op, left: m(f.left), right: m(f.right) };
    case 'onlyAfter':
      return { ...base, op: 'onlyAfter', left: m(f.left), right: m(f.right), windowS: f.windowS };
    case 'together':
      return { ...base, op: 'together', windowS: f.windowS, args: f.args.map(m) };
    case 'exclusive':
      return { ...base, op: 'exclusive', args: f.args.map(m) };
  }
}

function negate(atom: BoundAtom): BoundAtom {
  const opposite = { '<': '>=', '<=': '>', '>': '<=', '>=': '<', '=': '!=', '!=': '=' } as const;
  return { ...atom, cmp: opposite[atom.cmp] };
}

function measureUnit(kind: string, quantity: 'position' | 'speed' | 'angle'): string | null {
  if (kind === 'cylinder') return quantity === 'position' ? 'mm' : quantity === 'speed' ? 'mm/s' : null;
  if (kind === 'rotary') return quantity === 'angle' ? 'deg' : quantity === 'speed' ? 'deg/s' : null;
  return null;
}

/** `1V1.1.1` is tag 1V1 and port 1.1 when 1V1 is a tag: tags may hold dots, so the longest tag that fits wins. */
function splitTarget(target: string, byTag: ReadonlyMap<string, CircuitComponent>, at: Span): { tag: string; port: string } {
  let best: string | null = null;
  for (const tag of byTag.keys()) if (target.startsWith(`${tag}.`) && target.length > tag.length + 1 && (best === null || tag.length > best.length)) best = tag;
  if (best) return { tag: best, port: target.slice(best.length + 1) };
  const dot = target.lastIndexOf('.');
  throw new BindProblem(unknownTag(target.slice(0, dot), [...byTag.keys()]), at);
}

function unknownTag(tag: string, known: string[]): string {
  const near = known.find((k) => k.toLowerCase() === tag.toLowerCase());
  const list = known.length > 20 ? `${known.slice(0, 20).join(', ')} …` : known.join(', ');
  return `unknown tag '${tag}'${near ? ` (did you mean '${near}'?)` : ''}; the drawing's tags are ${list || 'none'}`;
}

/** "a 5/2 valve", "an emergency stop". */
function article(label: string): string {
  const lower = label.toLowerCase();
  return `${/^[aeiou]/.test(lower) ? 'an' : 'a'} ${lower}`;
}

function choices(words: readonly string[]): string {
  return words.length === 1 ? words[0]! : `${words.slice(0, -1).join(', ')} or ${words[words.length - 1]}`;
}
