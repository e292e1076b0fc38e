import type { Atom, Comparison, Formula, ParsedRule, RuleError, Span } from './ast';
import { KEYWORDS, tokenizeRules, type RuleToken } from './tokenizer';

/**
 * The parser: recursive descent over the tokens (comments dropped), one rule at a time. A
 * mistake ends the rule it is in; parsing goes on at the next `rule`, so every rule's first
 * mistake is reported. Precedence, loosest first: implies (right) · only after · until (right)
 * · or · and · not; the prefix operators always, never, eventually, once, historically take
 * everything to their right up to the closing parenthesis or the end of the rule.
 */
export function parseRules(text: string): { rules: ParsedRule[]; errors: RuleError[] } {
  const tokens = tokenizeRules(text).filter((t) => t.kind !== 'comment');
  const lines = lineStarts(text);
  const rules: ParsedRule[] = [];
  const errors: RuleError[] = [];
  let index = 0;
  while (index < tokens.length) {
    const parser = new RuleParser(text, tokens, index, lines);
    try {
      rules.push(parser.rule());
    } catch (e) {
      if (!(e instanceof SyntaxProblem)) throw e;
      errors.push({ ...position(lines, e.offset), message: e.message });
    }
    index = parser.nextRuleFrom(Math.max(parser.index, index + 1));
  }
  return { rules, errors };
}

class SyntaxProblem extends Error {
  constructor(
    message: string,
    readonly offset: number,
  ) {
    super(message);
  }
}

const PREFIX = new Set(['always', 'never', 'eventually', 'once', 'historically']);
const COMPARISONS = new Set(['<', '<=', '>', '>=', '=']);
const MEASURE_UNITS: Readonly<Record<string, string>> = { position: 'mm', speed: 'mm/s or deg/s', angle: 'deg' };

class RuleParser {
  constructor(
    private readonly source: string,
    private readonly tokens: readonly RuleToken[],
    public index: number,
    private readonly lines: readonly number[],
  ) {}

  rule(): ParsedRule {
    const start = this.peek();
    if (!this.isKeyword('rule')) this.fail(`expected 'rule' to start a rule, found ${this.found()}`);
    this.index += 1;
    const name = this.peek();
    if (!name || name.kind !== 'string') this.fail(`expected the rule's name in double quotes after 'rule', found ${this.found()}`);
    if (name.text.length < 2 || !name.text.endsWith('"')) this.fail(`expected a closing '"' at the end of the rule's name, found the end of the line`, name.to);
    if (name.text.trim() === '""') this.fail(`expected a name between the quotes, found an empty name`, name.from);
    this.index += 1;
    if (!this.isPunctuation(':')) this.fail(`expected ':' after the rule's name, found ${this.found()}`);
    this.index += 1;
    if (this.atRuleEnd()) this.fail(`expected a condition after ':', found ${this.found()} (the rule is empty)`);
    const formula = this.formula();
    if (!this.atRuleEnd()) this.fail(`expected 'and', 'or', 'implies', 'until', 'only after' or the next 'rule', found ${this.found()}`);
    return {
      name: name.text.slice(1, -1).trim(),
      line: position(this.lines, start!.from).line,
      formula,
      text: this.source.slice(start!.from, this.tokens[this.index - 1]!.to),
    };
  }

  nextRuleFrom(from: number): number {
    let i = from;
    while (i < this.tokens.length && !(this.tokens[i]!.kind === 'keyword' && this.tokens[i]!.text === 'rule')) i += 1;
    return i;
  }

  private formula(): Formula {
    const start = this.peek()!;
    const left = this.ordering();
    if (!this.isKeyword('implies')) return left;
    this.index += 1;
    this.expectOperand('implies');
    const right = this.formula();
    return this.node(start, { op: 'implies', left, right });
  }

  private ordering(): Formula {
    const start = this.peek()!;
    const left = this.until();
    if (!this.isKeyword('only')) return left;
    this.index += 1;
    if (!this.isKeyword('after')) this.fail(`expected 'after' after 'only', found ${this.found()}`);
    this.index += 1;
    this.expectOperand('only after');
    const right = this.until();
    if (!this.isKeyword('within')) this.fail(`expected 'within' and a duration to end 'only after', found ${this.found()}`);
    this.index += 1;
    const windowS = this.duration('within');
    return this.node(start, { op: 'onlyAfter', left, right, windowS });
  }

  private until(): Formula {
    const start = this.peek()!;
    const left = this.or();
    if (!this.isKeyword('until')) return left;
    this.index += 1;
    this.expectOperand('until');
    const right = this.until();
    return this.node(start, { op: 'until', left, right });
  }

  private or(): Formula {
    const start = this.peek()!;
    let left = this.and();
    while (this.isKeyword('or')) {
      this.index += 1;
      this.expectOperand('or');
      left = this.node(start, { op: 'or', left, right: this.and() });
    }
    return left;
  }

  private and(): Formula {
    const start = this.peek()!;
    let left = this.unary();
    while (this.isKeyword('and')) {
      this.index += 1;
      this.expectOperand('and');
      left = this.node(start, { op: 'and', left, right: this.unary() });
    }
    return left;
  }

  private unary(): Formula {
    const start = this.peek();
    if (!start || this.atRuleEnd()) this.fail(`expected a condition, found ${this.found()}`);
    if (start.kind === 'keyword') {
      const word = start.text;
      if (word === 'not') {
        this.index += 1;
        this.expectOperand('not');
        return this.node(start, { op: 'not', arg: this.unary() });
      }
      if (PREFIX.has(word)) return this.prefix(start);
      if (word === 'together') {
        this.index += 1;
        if (!this.isKeyword('within')) this.fail(`expected 'within' and a duration after 'together', found ${this.found()}`);
        this.index += 1;
        const windowS = this.duration('within');
        const args = this.list('together');
        return this.node(start, { op: 'together', windowS, args });
      }
      if (word === 'exclusive') {
        this.index += 1;
        return this.node(start, { op: 'exclusive', args: this.list('exclusive') });
      }
    }
    if (this.isPunctuation('(')) {
      this.index += 1;
      this.expectOperand('(');
      const inner = this.formula();
      if (!this.isPunctuation(')')) this.fail(`expected ')' to close the '(' at ${this.where(start.from)}, found ${this.found()}`);
      this.index += 1;
      return { ...inner, text: this.source.slice(start.from, this.tokens[this.index - 1]!.to), at: this.span(start.from, this.tokens[this.index - 1]!.to) };
    }
    return this.node(start, { op: 'atom', atom: this.atom() });
  }

  private prefix(start: RuleToken): Formula {
    const word = start.text;
    this.index += 1;
    let windowS: number | null = null;
    if (this.isKeyword('within')) {
      if (word === 'always' || word === 'never') this.fail(`'${word}' takes no window: write '${word} P' or use 'historically within'; found 'within'`);
      this.index += 1;
      windowS = this.duration('within');
    } else if (word === 'once' || word === 'historically') {
      this.fail(`expected 'within' and a duration after '${word}', found ${this.found()}`);
    }
    this.expectOperand(windowS === null ? word : `${word} within …`);
    const arg = this.formula();
    if (word === 'always' || word === 'never') return this.node(start, { op: word, arg });
    if (word === 'eventually') return this.node(start, { op: 'eventually', windowS, arg });
    return this.node(start, { op: word as 'once' | 'historically', windowS: windowS!, arg });
  }

  private list(what: string): Formula[] {
    if (!this.isPunctuation('(')) this.fail(`expected '(' and a list of conditions after '${what}', found ${this.found()}`);
    const open = this.peek()!;
    this.index += 1;
    const items: Formula[] = [];
    for (;;) {
      this.expectOperand(items.length === 0 ? '(' : ',');
      items.push(this.formula());
      if (this.isPunctuation(',')) {
        this.index += 1;
        continue;
      }
      if (this.isPunctuation(')')) break;
      this.fail(`expected ',' or ')' in the list of '${what}', found ${this.found()}`);
    }
    this.index += 1;
    if (items.length < 2) this.fail(`expected at least two conditions in '${what} (…)', found one`, open.from);
    return items;
  }

  private atom(): Atom {
    const first = this.peek()!;
    if (this.isKeyword('pressure')) {
      this.index += 1;
      if (!this.isKeyword('at')) this.fail(`expected 'at' after 'pressure', found ${this.found()}`);
      this.index += 1;
      const target = this.peek();
      if (!target || !(target.kind === 'tag' || target.kind === 'number') || !target.text.includes('.')) {
        this.fail(`expected a tag and port such as 1A1.A after 'pressure at', found ${this.found()}`);
      }
      this.index += 1;
      const { cmp, value, unit, unitAt } = this.comparison(`pressure at ${target.text}`, 'bar');
      return { kind: 'pressure', target: target.text, targetAt: this.span(target.from, target.to), cmp, value, unit, unitAt };
    }
    if (first.kind !== 'tag' && first.kind !== 'number' && first.kind !== 'word') {
      this.fail(`expected a condition such as '1A1 is extended' or a keyword such as 'always', found ${this.found()}`);
    }
    this.index += 1;
    const tagAt = this.span(first.from, first.to);
    const next = this.peek();
    if (next?.kind === 'keyword' && next.text === 'is') {
      this.index += 1;
      let negated = false;
      if (this.isKeyword('not')) {
        negated = true;
        this.index += 1;
      }
      const words: RuleToken[] = [];
      while (this.peek()?.kind === 'word') words.push(this.tokens[this.index++]!);
      if (words.length === 0) this.fail(`expected a state word after '${first.text} is', such as extended or pressed, found ${this.found()}`);
      const wordAt = this.span(words[0]!.from, words[words.length - 1]!.to);
      return { kind: 'state', tag: first.text, tagAt, word: words.map((w) => w.text).join(' '), wordAt, negated };
    }
    if (next?.kind === 'keyword' && (next.text === 'position' || next.text === 'speed' || next.text === 'angle')) {
      this.index += 1;
      const quantity = next.text;
      const { cmp, value, unit, unitAt } = this.comparison(`${first.text} ${quantity}`, MEASURE_UNITS[quantity]!);
      return { kind: 'measure', tag: first.text, tagAt, quantity, cmp, value, unit, unitAt };
    }
    const keyword = first.kind === 'tag' ? closestKeyword(first.text) : null;
    if (keyword && (next === undefined || next.kind !== 'keyword' || next.text === 'rule')) {
      this.fail(`unknown keyword '${first.text}' (did you mean '${keyword}'?)`, first.from);
    }
    this.fail(`expected 'is', 'position', 'speed' or 'angle' after '${first.text}', found ${this.found()}`);
  }

  private comparison(subject: string, units: string): { cmp: Comparison; value: number; unit: string; unitAt: Span } {
    const op = this.peek();
    if (!op || op.kind !== 'operator' || !COMPARISONS.has(op.text)) this.fail(`expected a comparison (<, <=, >, >= or =) after '${subject}', found ${this.found()}`);
    this.index += 1;
    const number = this.peek();
    if (!number || number.kind !== 'number') this.fail(`expected a number after '${op.text}', found ${this.found()}`);
    this.index += 1;
    const unit = this.peek();
    if (!unit || unit.kind !== 'unit') this.fail(`expected the unit (${units}) after ${number.text}, found ${this.found()}`);
    this.index += 1;
    return { cmp: op.text as Comparison, value: Number(number.text), unit: unit.text, unitAt: this.span(unit.from, unit.to) };
  }

  /** A duration in seconds: `N s` or `N ms`. */
  private duration(after: string): number {
    const number = this.peek();
    if (!number || number.kind !== 'number') this.fail(`expected a duration such as 0.5 s after '${after}', found ${this.found()}`);
    if (number.text.startsWith('-')) this.fail(`expected a duration of zero or more after '${after}', found '${number.text}'`);
    this.index += 1;
    const unit = this.peek();
    if (!unit || unit.kind !== 'unit' || (unit.text !== 's' && unit.text !== 'ms')) this.fail(`expected the unit s or ms after ${number.text}, found ${this.found()}`);
    this.index += 1;
    return unit.text === 'ms' ? Number(number.text) / 1000 : Number(number.text);
  }

  private expectOperand(after: string): void {
    if (this.atRuleEnd()) this.fail(`expected a condition after '${after}', found ${this.found()}`);
    const t = this.peek()!;
    if (t.kind === 'punctuation' && t.text !== '(') this.fail(`expected a condition after '${after}', found ${this.found()}`);
    if (t.kind === 'keyword' && ['and', 'or', 'implies', 'until', 'only', 'within', 'after', 'is'].includes(t.text)) {
      this.fail(`expected a condition after '${after}', found ${this.found()}`);
    }
  }

  private node(start: RuleToken, body: DistributiveOmit<Formula, 'text' | 'at'>): Formula {
    const end = this.tokens[this.index - 1]!.to;
    return { ...body, text: this.source.slice(start.from, end), at: this.span(start.from, end) } as Formula;
  }

  private peek(): RuleToken | undefined {
    return this.tokens[this.index];
  }

  private atRuleEnd(): boolean {
    return this.index >= this.tokens.length || this.isKeyword('rule');
  }

  private isKeyword(word: string): boolean {
    const t = this.tokens[this.index];
    return t !== undefined && t.kind === 'keyword' && t.text === word;
  }

  private isPunctuation(mark: string): boolean {
    const t = this.tokens[this.index];
    return t !== undefined && t.kind === 'punctuation' && t.text === mark;
  }

  private found(): string {
    const t = this.peek();
    if (!t) return 'the end of the text';
    if (t.kind === 'keyword' && t.text === 'rule') return "the next 'rule'";
    return `'${t.text}'`;
  }

  private fail(message: string, offset?: number): never {
    throw new SyntaxProblem(message, offset ?? this.peek()?.from ?? this.source.length);
  }

  private span(from: number, to: number): Span {
    return { ...position(this.lines, from), from, to };
  }

  private where(offset: number): string {
    const p = position(this.lines, offset);
    return `line ${p.line}, column ${p.column}`;
  }
}

type DistributiveOmit<T, K extends PropertyKey> = T extends unknown ? Omit<T, K> : never;

function lineStarts(text: string): number[] {
  const starts = [0];
  for (let i = 0; i < text.length; i += 1) if (text[i] === '\n') starts.push(i + 1);
  return starts;
}

function position(lines: readonly number[], offset: number): { line: number; column: number } {
  let lo = 0;
  let hi = lines.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (lines[mid]! <= offset) lo = mid;
    else hi = mid - 1;
  }
  return { line: lo + 1, column: offset - lines[lo]! + 1 };
}

/** A keyword within two edits of a misspelt word, so `alway (` gets a useful message. */
function closestKeyword(word: string): string | null {
  const lower = word.toLowerCase();
  let best: string | null = null;
  let bestDistance = 3;
  for (const keyword of KEYWORDS) {
    const d = editDistance(lower, keyword);
    if (d < bestDistance && (d < keyword.length / 2 || lower === keyword)) {
      best = keyword;
      bestDistance = d;
    }
  }
  return best;
}

function editDistance(a: string, b: string): number {
  let row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i += 1) {
    const next = [i];
    for (let j = 1; j <= b.length; j += 1) next[j] = Math.min(row[j]! + 1, next[j - 1]! + 1, row[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1));
    row = next;
  }
  return row[b.length]!;
}
