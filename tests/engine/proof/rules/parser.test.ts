import { describe, expect, it } from 'vitest';
import type { Formula } from '@/engine/proof/rules';
import { parseRules, tokenizeRules } from '@/engine/proof/rules';

/** The tree as a compact string, so expected shapes read at a glance: atoms as written, operators prefix. */
function shape(f: Formula): string {
  switch (f.op) {
    case 'atom': {
      const a = f.atom;
      if (a.kind === 'state') return `${a.tag}${a.negated ? '!' : ''}:${a.word}`;
      if (a.kind === 'measure') return `${a.tag}.${a.quantity}${a.cmp}${a.value}${a.unit}`;
      return `p(${a.target})${a.cmp}${a.value}${a.unit}`;
    }
    case 'not':
    case 'always':
    case 'never':
      return `${f.op}(${shape(f.arg)})`;
    case 'eventually':
      return f.windowS === null ? `eventually(${shape(f.arg)})` : `eventually[${f.windowS}](${shape(f.arg)})`;
    case 'once':
    case 'historically':
      return `${f.op}[${f.windowS}](${shape(f.arg)})`;
    case 'and':
    case 'or':
    case 'implies':
    case 'until':
      return `${f.op}(${shape(f.left)}, ${shape(f.right)})`;
    case 'onlyAfter':
      return `onlyAfter[${f.windowS}](${shape(f.left)}, ${shape(f.right)})`;
    case 'together':
      return `together[${f.windowS}](${f.args.map(shape).join(', ')})`;
    case 'exclusive':
      return `exclusive(${f.args.map(shape).join(', ')})`;
  }
}

const one = (body: string) => {
  const { rules, errors } = parseRules(`rule "r": ${body}`);
  expect(errors).toEqual([]);
  expect(rules).toHaveLength(1);
  return shape(rules[0]!.formula);
};

describe('parseRules: constructs', () => {
  it.each([
    ['1A1 is extended', '1A1:extended'],
    ['0R1 is at start', '0R1:at start'],
    ['1S1 is not pressed', '1S1!:pressed'],
    ['1A1 position >= 95 mm', '1A1.position>=95mm'],
    ['1A1 speed < 5 mm/s', '1A1.speed<5mm/s'],
    ['2A1 angle = 90 deg', '2A1.angle=90deg'],
    ['pressure at 1A1.A < 0.5 bar', 'p(1A1.A)<0.5bar'],
    ['pressure at 1V1.1.1 > 2 bar', 'p(1V1.1.1)>2bar'],
    ['K1.1 is closed', 'K1.1:closed'],
    ['always 1A1 is retracted', 'always(1A1:retracted)'],
    ['never 1A1 is moving', 'never(1A1:moving)'],
    ['eventually 1A1 is extended', 'eventually(1A1:extended)'],
    ['eventually within 2 s 1A1 is extended', 'eventually[2](1A1:extended)'],
    ['once within 300 ms S1 is pressed', 'once[0.3](S1:pressed)'],
    ['historically within 1.5 s S1 is pressed', 'historically[1.5](S1:pressed)'],
    ['S1 is pressed until 1A1 is extended', 'until(S1:pressed, 1A1:extended)'],
    ['1A1 is extending only after S1 is pressed within 0.3 s', 'onlyAfter[0.3](1A1:extending, S1:pressed)'],
    ['together within 0.5 s (1S1 is pressed, 1S2 is pressed)', 'together[0.5](1S1:pressed, 1S2:pressed)'],
    ['exclusive (2M1 is on, 2M2 is on, 2M3 is on)', 'exclusive(2M1:on, 2M2:on, 2M3:on)'],
    ['pressure at 1A1.A >= 0.5bar', 'p(1A1.A)>=0.5bar'],
  ])('%s', (body, expected) => {
    expect(one(body)).toBe(expected);
  });

  it('parses the two-hand rule of the brief', () => {
    expect(one('1A1 is extending only after together within 0.5 s (1S1 is pressed, 1S2 is pressed) within 0.3 s')).toBe(
      'onlyAfter[0.3](1A1:extending, together[0.5](1S1:pressed, 1S2:pressed))',
    );
  });
});

describe('parseRules: precedence', () => {
  it.each([
    // not binds tightest, then and, then or.
    ['not A is on and B is on or C is on', 'or(and(not(A:on), B:on), C:on)'],
    ['A is on or B is on and C is on', 'or(A:on, and(B:on, C:on))'],
    // implies is loosest and groups to the right.
    ['A is on implies B is on implies C is on', 'implies(A:on, implies(B:on, C:on))'],
    ['A is on and B is on implies C is on', 'implies(and(A:on, B:on), C:on)'],
    // until sits between or and only after, and groups to the right.
    ['A is on or B is on until C is on until D is on', 'until(or(A:on, B:on), until(C:on, D:on))'],
    ['A is on until B is on only after C is on within 1 s', 'onlyAfter[1](until(A:on, B:on), C:on)'],
    ['A is on only after B is on within 1 s implies C is on', 'implies(onlyAfter[1](A:on, B:on), C:on)'],
    // A prefix operator takes everything to its right.
    ['always A is on implies B is on', 'always(implies(A:on, B:on))'],
    ['never A is on and B is on', 'never(and(A:on, B:on))'],
    ['A is on and always B is on or C is on', 'and(A:on, always(or(B:on, C:on)))'],
    // ... up to the closing parenthesis.
    ['(always A is on) implies B is on', 'implies(always(A:on), B:on)'],
    ['always (S1 is pressed implies eventually within 2 s 1A1 is extended)', 'always(implies(S1:pressed, eventually[2](1A1:extended)))'],
  ])('%s', (body, expected) => {
    expect(one(body)).toBe(expected);
  });
});

describe('parseRules: text', () => {
  it('reads several multi-line rules with comments, names, lines and texts', () => {
    const text = [
      '# Harrow Lane lid press',
      'rule "two-hand start": # ISO 13851',
      '  1A1 is extending only after',
      '    together within 0.5 s (1S1 is pressed,  # left',
      '                           1S2 is pressed)  # right',
      '    within 0.3 s',
      '',
      'rule "no double solenoid":',
      '  exclusive (2M1 is on, 2M2 is on)',
    ].join('\n');
    const { rules, errors } = parseRules(text);
    expect(errors).toEqual([]);
    expect(rules.map((r) => [r.name, r.line])).toEqual([
      ['two-hand start', 2],
      ['no double solenoid', 8],
    ]);
    expect(shape(rules[0]!.formula)).toBe('onlyAfter[0.3](1A1:extending, together[0.5](1S1:pressed, 1S2:pressed))');
    expect(rules[1]!.text).toBe('rule "no double solenoid":\n  exclusive (2M1 is on, 2M2 is on)');
  });

  it('accepts an empty text', () => {
    expect(parseRules('  # nothing yet\n')).toEqual({ rules: [], errors: [] });
  });
});

describe('parseRules: mistakes', () => {
  const errorsOf = (text: string) => parseRules(text).errors;

  it.each([
    ['missing closing quote', 'rule "start: 1A1 is extended', 1, 29, `expected a closing '"' at the end of the rule's name, found the end of the line`],
    ['missing name', 'rule: 1A1 is extended', 1, 5, "expected the rule's name in double quotes after 'rule', found ':'"],
    ['empty name', 'rule "": 1A1 is extended', 1, 6, 'expected a name between the quotes, found an empty name'],
    ['missing colon', 'rule "a" 1A1 is extended', 1, 10, "expected ':' after the rule's name, found '1A1'"],
    ['unknown keyword', 'rule "a": alway (1A1 is extended)', 1, 11, "unknown keyword 'alway' (did you mean 'always'?)"],
    ['missing duration unit', 'rule "a": eventually within 2 (1A1 is extended)', 1, 31, "expected the unit s or ms after 2, found '('"],
    ['missing duration', 'rule "a": eventually within (1A1 is extended)', 1, 29, "expected a duration such as 0.5 s after 'within', found '('"],
    ['unbalanced parenthesis', 'rule "a": always (1A1 is extended', 1, 34, "expected ')' to close the '(' at line 1, column 18, found the end of the text"],
    ['empty rule', 'rule "a":\nrule "b": 1A1 is extended', 2, 1, "expected a condition after ':', found the next 'rule' (the rule is empty)"],
    ['trailing garbage', 'rule "a": 1A1 is extended 1A2', 1, 27, "expected 'and', 'or', 'implies', 'until', 'only after' or the next 'rule', found '1A2'"],
    ['missing state word', 'rule "a": 1A1 is and 1A2 is extended', 1, 18, "expected a state word after '1A1 is', such as extended or pressed, found 'and'"],
    ['missing is', 'rule "a": 1A1 extended', 1, 15, "expected 'is', 'position', 'speed' or 'angle' after '1A1', found 'extended'"],
    ['once without window', 'rule "a": once S1 is pressed', 1, 16, "expected 'within' and a duration after 'once', found 'S1'"],
    ['only without after', 'rule "a": A is on only B is on within 1 s', 1, 24, "expected 'after' after 'only', found 'B'"],
    ['only after without window', 'rule "a": A is on only after B is on', 1, 37, "expected 'within' and a duration to end 'only after', found the end of the text"],
    ['dangling and', 'rule "a": A is on and', 1, 22, "expected a condition after 'and', found the end of the text"],
    ['missing unit on a measure', 'rule "a": 1A1 position > 50', 1, 28, "expected the unit (mm) after 50, found the end of the text"],
    ['missing comparison', 'rule "a": pressure at 1A1.A 3 bar', 1, 29, "expected a comparison (<, <=, >, >= or =) after 'pressure at 1A1.A', found '3'"],
    ['one-item exclusive', 'rule "a": exclusive (A is on)', 1, 21, "expected at least two conditions in 'exclusive (…)', found one"],
    ['text before the first rule', 'always A is on', 1, 1, "expected 'rule' to start a rule, found 'always'"],
  ])('%s', (_what, text, line, column, message) => {
    expect(errorsOf(text)).toEqual([{ line, column, message }]);
  });

  it('reports every broken rule, recovering at the next rule, and keeps the good ones', () => {
    const text = ['rule "a" A is on', 'rule "b": A is on', 'rule "c": always (A is on', '', 'rule "d": B is on and', 'rule "e": eventually within 2 (A is on)'].join('\n');
    const { rules, errors } = parseRules(text);
    expect(rules.map((r) => r.name)).toEqual(['b']);
    expect(errors.map((e) => [e.line, e.column])).toEqual([
      [1, 10],
      [5, 1],
      [6, 1],
      [6, 31],
    ]);
  });
});

describe('tokenizeRules', () => {
  const kinds = (text: string) => tokenizeRules(text).map((t) => `${t.kind}:${t.text}`);

  it('tells tags, words, numbers and units apart by context', () => {
    expect(kinds('rule "r": 0R1 is at start and 1A1 speed < 5 mm/s or K1.1 is closed # note')).toEqual([
      'keyword:rule',
      'string:"r"',
      'punctuation::',
      'tag:0R1',
      'keyword:is',
      'word:at',
      'word:start',
      'keyword:and',
      'tag:1A1',
      'keyword:speed',
      'operator:<',
      'number:5',
      'unit:mm/s',
      'keyword:or',
      'tag:K1.1',
      'keyword:is',
      'word:closed',
      'comment:# note',
    ]);
  });

  it('splits a number from its unit, reads negative numbers, and marks what it cannot read', () => {
    expect(kinds('within 0.5s 300ms -2 mm/s 1A1 $')).toEqual(['keyword:within', 'number:0.5', 'unit:s', 'number:300', 'unit:ms', 'number:-2', 'unit:mm/s', 'tag:1A1', 'unknown:$']);
  });

  it('gives offsets that slice back to each token, and never throws on half-typed text', () => {
    const text = 'rule "unfinished: pressure at 1A1. <= §';
    const tokens = tokenizeRules(text);
    for (const t of tokens) expect(text.slice(t.from, t.to)).toBe(t.text);
    expect(tokens.map((t) => t.kind)).toEqual(['keyword', 'string']);
    expect(tokenizeRules('pressure at 1A1. <= §').map((t) => t.kind)).toEqual(['keyword', 'keyword', 'tag', 'operator', 'unknown']);
  });
});
