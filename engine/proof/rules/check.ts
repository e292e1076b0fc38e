import type { Trace } from '../../trace/trace';
import type { BoundAtom, BoundFormula, BoundRule } from './ast';

/**
 * Point-based metric temporal logic over the trace's samples (Koymans 1990; over sampled
 * signals as in Maler & Nickovic, FORMATS 2004), with three truth values so that a window
 * running past the last sample is undecided rather than violated. Each operator is one or two
 * linear passes over the samples (sliding windows by index pointers), so a rule costs O(n) in
 * the trace length times its size.
 */

/** Truth values, ordered so that `and` is min, `or` is max and `not` is 2 − v (Kleene logic). */
const F = 0;
const U = 1;
const T = 2;
type Values = Uint8Array;

/** Window edges are inclusive; sample times carry rounding, so edges are compared within this, s. */
const EDGE_S = 1e-9;

export interface RuleVerdict {
  name: string;
  line: number;
  holds: boolean;
  /** Time of the first sample where the rule is known violated; null when it holds or cannot be checked. */
  violatedAtS: number | null;
  /** One plain sentence saying where and how it failed, or over what it held. */
  explanation: string;
  tags: string[];
}

class MissingSignal extends Error {}

/** Checks one rule: its formula at the first sample of the trace. */
export function checkRule(rule: BoundRule, trace: Trace): RuleVerdict {
  const base = { name: rule.name, line: rule.line, tags: rule.tags };
  const n = trace.time.length;
  if (n === 0) return { ...base, holds: true, violatedAtS: null, explanation: 'the trace has no samples, so nothing was checked' };
  const checker = new Checker(trace);
  let values: Values;
  try {
    values = checker.eval(rule.formula);
  } catch (e) {
    if (!(e instanceof MissingSignal)) throw e;
    return { ...base, holds: false, violatedAtS: null, explanation: `could not be checked: the trace has no signal '${e.message}' (was it simulated from another revision of the drawing?)` };
  }
  const span = `${Number(trace.time[0]!.toFixed(3))}–${formatS(trace.time[n - 1]!)}`;
  if (values[0] === T) return { ...base, holds: true, violatedAtS: null, explanation: `held over the whole run (${span})` };
  if (values[0] === U) {
    return { ...base, holds: true, violatedAtS: null, explanation: `held over the whole run (${span}); a window that runs past the end of the trace was left undecided, not counted as a violation` };
  }
  const found = checker.explain(rule.formula, 0);
  return { ...base, holds: false, violatedAtS: trace.time[found.index]!, explanation: found.sentence };
}

/**
 * Where a bound formula is known to hold, sample by sample (1 holds, 0 not or undecided): the
 * replay turns `<tag> is <word>` into the series it compares with a recorded sensor. Null when
 * the trace lacks a signal the formula reads.
 */
export function formulaSeries(formula: BoundFormula, trace: Trace): Uint8Array | null {
  try {
    return new Checker(trace).eval(formula).map((v) => (v === T ? 1 : 0));
  } catch (e) {
    if (e instanceof MissingSignal) return null;
    throw e;
  }
}

export function checkRules(rules: readonly BoundRule[], trace: Trace): RuleVerdict[] {
  return rules.map((rule) => checkRule(rule, trace));
}

/** How far any rule looks back or ahead from a moment, s: windows nested inside one another add up (0 when none has one). */
export function longestWindowS(rules: readonly BoundRule[]): number {
  const walk = (f: BoundFormula): number => {
    switch (f.op) {
      case 'atom':
        return 0;
      case 'not':
      case 'always':
      case 'never':
        return walk(f.arg);
      case 'eventually':
        return (f.windowS ?? 0) + walk(f.arg);
      case 'once':
      case 'historically':
        return f.windowS + walk(f.arg);
      case 'and':
      case 'or':
      case 'implies':
      case 'until':
        return Math.max(walk(f.left), walk(f.right));
      case 'onlyAfter':
        return Math.max(walk(f.left), f.windowS + walk(f.right));
      case 'together':
        return f.windowS + Math.max(0, ...f.args.map(walk));
      case 'exclusive':
        return Math.max(0, ...f.args.map(walk));
    }
  };
  return Math.max(0, ...rules.map((r) => walk(r.formula)));
}

class Checker {
  private readonly n: number;
  private readonly t: readonly number[];
  private readonly cache = new Map<BoundFormula, Values>();
  private readonly columns = new Map<string, readonly number[]>();

  constructor(trace: Trace) {
    this.n = trace.time.length;
    this.t = trace.time;
    for (const s of trace.signals) this.columns.set(s.name, s.values);
  }

  eval(f: BoundFormula): Values {
    const hit = this.cache.get(f);
    if (hit) return hit;
    const v = this.compute(f);
    this.cache.set(f, v);
    return v;
  }

  private compute(f: BoundFormula): Values {
    switch (f.op) {
      case 'atom':
        return this.atom(f.atom);
      case 'not':
        return not(this.eval(f.arg));
      case 'and':
        return zip(this.eval(f.left), this.eval(f.right), Math.min);
      case 'or':
        return zip(this.eval(f.left), this.eval(f.right), Math.max);
      case 'implies':
        return zip(not(this.eval(f.left)), this.eval(f.right), Math.max);
      case 'always':
        return always(this.eval(f.arg));
      case 'never':
        return always(not(this.eval(f.arg)));
      case 'eventually':
        return f.windowS === null ? eventually(this.eval(f.arg)) : this.eventuallyWithin(this.eval(f.arg), f.windowS);
      case 'once':
        return this.onceWithin(this.eval(f.arg), f.windowS);
      case 'historically':
        return not(this.onceWithin(not(this.eval(f.arg)), f.windowS));
      case 'until':
        return until(this.eval(f.left), this.eval(f.right));
      case 'onlyAfter':
        return always(this.onlyAfterBody(f));
      case 'together':
        return this.together(f);
      case 'exclusive':
        return always(this.atMostOne(f));
    }
  }

  private atom(a: BoundAtom): Values {
    const out = new Uint8Array(this.n);
    let column: readonly number[] | null = null;
    if (a.signal !== null) {
      column = this.columns.get(a.signal) ?? null;
      if (!column) throw new MissingSignal(a.signal);
    }
    for (let i = 0; i < this.n; i += 1) {
      const raw = column ? column[i]! : a.constant;
      const x = a.magnitude ? Math.abs(raw) : raw;
      let ok: boolean;
      switch (a.cmp) {
        case '<':
          ok = x < a.threshold;
          break;
        case '<=':
          ok = x <= a.threshold;
          break;
        case '>':
          ok = x > a.threshold;
          break;
        case '>=':
          ok = x >= a.threshold;
          break;
        case '=':
          ok = Math.abs(x - a.threshold) <= a.tolerance;
          break;
        case '!=':
          ok = Math.abs(x - a.threshold) > a.tolerance;
          break;
      }
      out[i] = ok ? T : F;
    }
    return out;
  }

  /** Best value of p over the samples in [t_i − w, t_i]; samples before the trace's start do not exist. */
  onceWithin(p: Values, w: number): Values {
    const out = new Uint8Array(this.n);
    let lastT = -1;
    let lastU = -1;
    let left = 0;
    for (let i = 0; i < this.n; i += 1) {
      if (p[i] === T) lastT = i;
      if (p[i]! >= U) lastU = i;
      while (this.t[left]! < this.t[i]! - w - EDGE_S) left += 1;
      out[i] = lastT >= left ? T : lastU >= left ? U : F;
    }
    return out;
  }

  /** Best value of p over [t_i, t_i + w]; undecided at best when the window reaches past the last sample. */
  private eventuallyWithin(p: Values, w: number): Values {
    const n = this.n;
    const nextT = new Int32Array(n);
    const nextU = new Int32Array(n);
    let nt = n;
    let nu = n;
    for (let i = n - 1; i >= 0; i -= 1) {
      if (p[i] === T) nt = i;
      if (p[i]! >= U) nu = i;
      nextT[i] = nt;
      nextU[i] = nu;
    }
    const out = new Uint8Array(n);
    const end = this.t[n - 1]!;
    let right = 0;
    for (let i = 0; i < n; i += 1) {
      if (right < i) right = i;
      while (right + 1 < n && this.t[right + 1]! <= this.t[i]! + w + EDGE_S) right += 1;
      let v = nextT[i]! <= right ? T : nextU[i]! <= right ? U : F;
      if (v === F && this.t[i]! + w > end + EDGE_S) v = U;
      out[i] = v;
    }
    return out;
  }

  /** At each sample: a rising edge of the left side implies the right side held within the window before. */
  private onlyAfterBody(f: Extract<BoundFormula, { op: 'onlyAfter' }>): Values {
    return zip(not(rising(this.eval(f.left))), this.onceWithin(this.eval(f.right), f.windowS), Math.max);
  }

  private together(f: Extract<BoundFormula, { op: 'together' }>): Values {
    let out: Values | null = null;
    for (const arg of f.args) {
      const p = this.eval(arg);
      const fresh = zip(p, this.onceWithin(not(p), f.windowS), Math.min);
      out = out ? zip(out, fresh, Math.min) : fresh;
    }
    return out!;
  }

  private atMostOne(f: Extract<BoundFormula, { op: 'exclusive' }>): Values {
    const args = f.args.map((a) => this.eval(a));
    const out = new Uint8Array(this.n);
    for (let i = 0; i < this.n; i += 1) {
      let sure = 0;
      let maybe = 0;
      for (const a of args) {
        if (a[i] === T) sure += 1;
        else if (a[i] === U) maybe += 1;
      }
      out[i] = sure >= 2 ? F : sure + maybe <= 1 ? T : U;
    }
    return out;
  }

  /** Finds the sample where f, false at sample i, is first known violated, and says why in one sentence. */
  explain(f: BoundFormula, i: number): { index: number; sentence: string } {
    const at = (j: number) => formatS(this.t[j]!);
    switch (f.op) {
      case 'always': {
        const j = firstFalse(this.eval(f.arg), i);
        return { index: j, sentence: this.whyFalse(f.arg, j) };
      }
      case 'never': {
        const j = firstFalse(not(this.eval(f.arg)), i);
        return { index: j, sentence: `${quote(f.arg)} held at ${at(j)}, which the rule forbids` };
      }
      case 'exclusive': {
        const j = firstFalse(this.atMostOne(f), i);
        const both = f.args.filter((a) => this.eval(a)[j] === T).map(quote);
        return { index: j, sentence: `${joinAnd(both)} held at the same time at ${at(j)}` };
      }
      case 'onlyAfter': {
        const j = firstFalse(this.onlyAfterBody(f), i);
        return { index: j, sentence: `${started(f.left)} at ${at(j)} without ${describe(f.right)} in the ${formatS(f.windowS)} before` };
      }
      case 'and': {
        const parts = [f.left, f.right].filter((g) => this.eval(g)[i] === F).map((g) => this.explain(g, i));
        return parts.reduce((a, b) => (b.index < a.index ? b : a));
      }
      default:
        return { index: i, sentence: this.whyFalse(f, i) };
    }
  }

  /** Why f is false at sample j, for the usual shapes of a rule's body. */
  private whyFalse(f: BoundFormula, j: number): string {
    const at = formatS(this.t[j]!);
    if (f.op === 'implies') {
      const r = f.right;
      if (r.op === 'eventually' && r.windowS !== null) {
        return `${quote(f.left)} at ${at}, but ${quote(r.arg)} did not follow within ${formatS(r.windowS)} (by ${formatS(this.t[j]! + r.windowS)})`;
      }
      if (r.op === 'once') return `${quote(f.left)} at ${at} without ${quote(r.arg)} in the ${formatS(r.windowS)} before`;
      if (r.op === 'not') return `${quote(f.left)} and ${quote(r.arg)} at ${at}`;
      return `${quote(f.left)} at ${at}, but not ${quote(r)}`;
    }
    if (f.op === 'not') return `${quote(f.arg)} held at ${at}, which the rule forbids`;
    return `the condition ${quote(f)} failed at ${at}`;
  }
}

function not(p: Values): Values {
  const out = new Uint8Array(p.length);
  for (let i = 0; i < p.length; i += 1) out[i] = T - p[i]!;
  return out;
}

function zip(a: Values, b: Values, fn: (x: number, y: number) => number): Values {
  const out = new Uint8Array(a.length);
  for (let i = 0; i < a.length; i += 1) out[i] = fn(a[i]!, b[i]!);
  return out;
}

/** Worst value from each sample to the end of the run. */
function always(p: Values): Values {
  const out = new Uint8Array(p.length);
  let acc = T;
  for (let i = p.length - 1; i >= 0; i -= 1) out[i] = acc = Math.min(acc, p[i]!);
  return out;
}

/** Best value from each sample to the end of the run: unbounded, so the end of the run decides. */
function eventually(p: Values): Values {
  const out = new Uint8Array(p.length);
  let acc = F;
  for (let i = p.length - 1; i >= 0; i -= 1) out[i] = acc = Math.max(acc, p[i]!);
  return out;
}

/** Strong until: q at some sample from now on, p at every sample before it. */
function until(p: Values, q: Values): Values {
  const out = new Uint8Array(p.length);
  let acc = F;
  for (let i = p.length - 1; i >= 0; i -= 1) out[i] = acc = Math.max(q[i]!, Math.min(p[i]!, acc));
  return out;
}

/** p holds now and did not at the sample before; at the first sample, p holding is an edge. */
function rising(p: Values): Values {
  const out = new Uint8Array(p.length);
  for (let i = 0; i < p.length; i += 1) out[i] = i === 0 ? p[0]! : Math.min(p[i]!, T - p[i - 1]!);
  return out;
}

function firstFalse(p: Values, from: number): number {
  for (let j = from; j < p.length; j += 1) if (p[j] === F) return j;
  return from;
}

function quote(f: BoundFormula): string {
  return f.text.replace(/\s+/g, ' ');
}

/** "1A1 started extending", "1B2 became on", or the condition quoted. */
function started(f: BoundFormula): string {
  const m = /^(\S+) is (.+)$/.exec(quote(f));
  if (f.op === 'atom' && m && !m[2]!.startsWith('not ')) return m[2]!.endsWith('ing') ? `${m[1]} started ${m[2]}` : `${m[1]} became ${m[2]}`;
  return `${quote(f)} became true`;
}

/** "1S1 and 1S2 pressed together within 0.5 s" for the usual two-hand shape; otherwise the condition quoted. */
function describe(f: BoundFormula): string {
  if (f.op !== 'together') return quote(f);
  const parts = f.args.map((a) => /^(\S+) is (.+)$/.exec(quote(a)));
  const word = parts[0]?.[2];
  if (parts.every((p) => p && p[2] === word && f.args.every((a) => a.op === 'atom'))) {
    return `${joinAnd(parts.map((p) => p![1]!))} ${word} together within ${formatS(f.windowS)}`;
  }
  return `${joinAnd(f.args.map(quote))} together within ${formatS(f.windowS)}`;
}

function joinAnd(items: readonly string[]): string {
  return items.length <= 2 ? items.join(' and ') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/** Seconds for a sentence: up to three decimals, trailing zeros dropped ("2.06 s", "0.5 s", "4 s"). */
export function formatS(s: number): string {
  return `${Number(s.toFixed(3))} s`;
}
