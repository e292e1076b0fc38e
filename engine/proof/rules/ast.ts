/**
 * The syntax tree of the rule language. One shape serves parsed and bound rules: a parsed
 * formula carries the atoms as written (`Atom`), a bound one the trace tests they became
 * (`BoundAtom`), so the checker and the explainer walk one union.
 */

/** Comparison as written; `=` holds within the tolerance of its quantity (README, "Comparisons"). */
export type Comparison = '<' | '<=' | '>' | '>=' | '=';

/** Where a piece of the text sits: 1-based line and column, offsets into the whole text. */
export interface Span {
  line: number;
  column: number;
  from: number;
  to: number;
}

/** A condition on one component, as written. */
export type Atom =
  /** `1A1 is extended`, `1S1 is not pressed`, `0R1 is at start`. */
  | { kind: 'state'; tag: string; tagAt: Span; word: string; wordAt: Span; negated: boolean }
  /** `1A1 position > 50 mm`, `1A1 speed < 5 mm/s`, `2A1 angle >= 85 deg`. */
  | { kind: 'measure'; tag: string; tagAt: Span; quantity: 'position' | 'speed' | 'angle'; cmp: Comparison; value: number; unit: string; unitAt: Span }
  /** `pressure at 1A1.A < 0.5 bar`: `target` is the tag and port as one token, split when bound. */
  | { kind: 'pressure'; target: string; targetAt: Span; cmp: Comparison; value: number; unit: string; unitAt: Span };

/**
 * A test on one trace signal at one sample, in the signal's own SI units. `signal` null means
 * the value is the constant `constant` (a port that vents straight to atmosphere has no signal).
 */
export interface BoundAtom {
  signal: string | null;
  constant: number;
  /** Compare |value| instead of the value (speeds, "is moving"). */
  magnitude: boolean;
  cmp: Comparison | '!=';
  threshold: number;
  /** Half-width of the band `=` and `!=` use, in the signal's units. */
  tolerance: number;
}

/** A formula over atoms of type A. Every node keeps the text it was written as, for explanations. */
export type FormulaOf<A> = { text: string; at: Span } & (
  | { op: 'atom'; atom: A }
  | { op: 'not'; arg: FormulaOf<A> }
  | { op: 'and' | 'or' | 'implies' | 'until'; left: FormulaOf<A>; right: FormulaOf<A> }
  | { op: 'always' | 'never'; arg: FormulaOf<A> }
  /** `windowS` null: unbounded, to the end of the run. */
  | { op: 'eventually'; windowS: number | null; arg: FormulaOf<A> }
  | { op: 'once' | 'historically'; windowS: number; arg: FormulaOf<A> }
  | { op: 'onlyAfter'; left: FormulaOf<A>; right: FormulaOf<A>; windowS: number }
  | { op: 'together'; windowS: number; args: FormulaOf<A>[] }
  | { op: 'exclusive'; args: FormulaOf<A>[] }
);

export type Formula = FormulaOf<Atom>;
export type BoundFormula = FormulaOf<BoundAtom>;

/** A mistake in a rules text, 1-based; the message says what was expected and what was found. */
export interface RuleError {
  line: number;
  column: number;
  message: string;
}

export interface ParsedRule {
  name: string;
  /** Line of the `rule` keyword. */
  line: number;
  formula: Formula;
  /** The rule's source, from `rule` to the end of its formula. */
  text: string;
}

export interface BoundRule {
  name: string;
  line: number;
  formula: BoundFormula;
  /** Trace signal names the rule reads. */
  signals: string[];
  /** Component tags the rule names, in order of first mention. */
  tags: string[];
}
