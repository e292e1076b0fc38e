/**
 * The tokenizer of the rule language. It never throws: anything it cannot read becomes an
 * `unknown` token, so the editor can highlight half-typed text and the parser can say where.
 */

export type RuleTokenKind = 'keyword' | 'tag' | 'word' | 'number' | 'unit' | 'string' | 'comment' | 'operator' | 'punctuation' | 'unknown';

export interface RuleToken {
  kind: RuleTokenKind;
  text: string;
  /** Offsets into the text: `text.slice(from, to)` is the token. */
  from: number;
  to: number;
}

export const KEYWORDS: ReadonlySet<string> = new Set([
  'rule',
  'always',
  'never',
  'eventually',
  'within',
  'once',
  'historically',
  'until',
  'only',
  'after',
  'together',
  'exclusive',
  'not',
  'and',
  'or',
  'implies',
  'is',
  'pressure',
  'at',
  'position',
  'speed',
  'angle',
]);

const UNITS: ReadonlySet<string> = new Set(['s', 'ms', 'mm', 'mm/s', 'deg', 'deg/s', 'bar']);

/** Tags as the trade writes them (1A1, K1.1, 0Z1, S-3); numbers are told apart by their shape. */
const RUN = /[A-Za-z0-9][A-Za-z0-9._-]*/y;
const NUMBER = /^-?\d+(?:\.\d+)?$/;
const NUMBER_WITH_UNIT = /^(\d+(?:\.\d+)?)(ms|s|mm|deg|bar)$/;

/**
 * Splits a rules text into tokens. Context decides two things the characters cannot: a name
 * after `is` (or `is not`) is a state `word`, elsewhere a `tag`; a name right after a number is
 * a `unit` when it is one. A state is one word, or two after `at` or `turning` ("at start").
 */
export function tokenizeRules(text: string): RuleToken[] {
  const tokens: RuleToken[] = [];
  let at = 0;
  let inPhrase = false;
  let before: RuleToken | undefined;
  const push = (kind: RuleTokenKind, from: number, to: number) => {
    const token = { kind, text: text.slice(from, to), from, to };
    tokens.push(token);
    if (kind !== 'comment') before = token;
  };

  while (at < text.length) {
    const c = text[at]!;
    if (/\s/.test(c)) {
      at += 1;
      continue;
    }
    if (c === '#') {
      const end = lineEnd(text, at);
      push('comment', at, end);
      at = end;
      continue;
    }
    if (c === '"') {
      const close = text.indexOf('"', at + 1);
      const end = lineEnd(text, at);
      // An unclosed name runs to the end of its line; the parser reports the missing quote.
      const to = close >= 0 && close < end ? close + 1 : end;
      push('string', at, to);
      at = to;
      inPhrase = false;
      continue;
    }
    if (c === '<' || c === '>') {
      const to = text[at + 1] === '=' ? at + 2 : at + 1;
      push('operator', at, to);
      at = to;
      inPhrase = false;
      continue;
    }
    if (c === '=') {
      push('operator', at, at + 1);
      at += 1;
      inPhrase = false;
      continue;
    }
    if (c === '(' || c === ')' || c === ',' || c === ':') {
      push('punctuation', at, at + 1);
      at += 1;
      inPhrase = false;
      continue;
    }
    if (c === '-' && /[0-9]/.test(text[at + 1] ?? '')) {
      RUN.lastIndex = at + 1;
      const run = RUN.exec(text)![0];
      const to = at + 1 + run.length;
      push(NUMBER.test(`-${run}`) ? 'number' : 'unknown', at, to);
      at = to;
      inPhrase = false;
      continue;
    }
    RUN.lastIndex = at;
    const match = RUN.exec(text);
    if (!match) {
      push('unknown', at, at + 1);
      at += 1;
      continue;
    }
    const run = match[0];
    let to = at + run.length;
    if (NUMBER.test(run)) {
      push('number', at, to);
      inPhrase = false;
    } else if (NUMBER_WITH_UNIT.test(run) && !inPhrase) {
      const digits = NUMBER_WITH_UNIT.exec(run)![1]!;
      push('number', at, at + digits.length);
      to = unitEnd(text, to, run.slice(digits.length));
      push('unit', at + digits.length, to);
    } else if (before?.kind === 'number' && UNITS.has(run)) {
      to = unitEnd(text, to, run);
      push('unit', at, to);
    } else if (inPhrase && (run === 'at' || !KEYWORDS.has(run))) {
      push('word', at, to);
      // A state is one word, or two where the first needs the second: "at start", "turning back".
      inPhrase = run === 'at' || run === 'turning';
    } else if (KEYWORDS.has(run)) {
      push('keyword', at, to);
      inPhrase = run === 'is' || (inPhrase && run === 'not');
    } else {
      push('tag', at, to);
    }
    at = to;
  }
  return tokens;
}

/** `mm/s` and `deg/s` are one unit though `/` cannot be part of a name. */
function unitEnd(text: string, to: number, unit: string): number {
  return (unit === 'mm' || unit === 'deg') && text.startsWith('/s', to) && !/[A-Za-z0-9._-]/.test(text[to + 2] ?? '') ? to + 2 : to;
}

function lineEnd(text: string, from: number): number {
  const end = text.indexOf('\n', from);
  return end < 0 ? text.length : end;
}
