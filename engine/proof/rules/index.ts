/** The rule language for interlock proofs: parse, bind to a drawing, check on traces. See README.md. */
export type { RuleError, ParsedRule, BoundRule, Formula, BoundFormula, Atom, BoundAtom, Comparison, Span } from './ast';
export { parseRules } from './parser';
export { bindRules, compileRulesText } from './bind';
export { checkRule, checkRules, formulaSeries, longestWindowS, type RuleVerdict } from './check';
export { ruleTemplates, type RuleTemplate } from './templates';
export { ruleVocabulary, type VocabularyEntry } from './vocabulary';
export { tokenizeRules, type RuleToken, type RuleTokenKind } from './tokenizer';
