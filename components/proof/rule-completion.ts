import { tokenizeRules, type VocabularyEntry } from '@/engine/proof/rules';

export interface Suggestion {
  /** What the list shows. */
  label: string;
  /** What replaces the word being typed. */
  insert: string;
  /** A short note beside it: the part's type, or what a keyword does. */
  detail: string;
}

export interface Completion {
  /** The span of the text the chosen suggestion replaces. */
  from: number;
  to: number;
  items: Suggestion[];
}

/** Words that start a formula, with what they do, offered where a tag could also go. */
const STARTERS: ReadonlyArray<readonly [string, string]> = [
  ['always', 'holds at every moment'],
  ['never', 'is never true'],
  ['eventually within', 'becomes true within a time'],
  ['once within', 'was true within the last …'],
  ['together within', 'all became true within … of each other'],
  ['exclusive', 'at most one is true at any moment'],
  ['pressure at', 'a port pressure in bar (gauge)'],
  ['not', 'negation'],
];

const CONNECTIVES: ReadonlyArray<readonly [string, string]> = [
  ['and', 'both'],
  ['or', 'either'],
  ['implies', 'if … then'],
  ['until', '… holds until …'],
  ['only after', '… may start only after …'],
  ['within', 'a time window'],
];

const AFTER_TAG: ReadonlyArray<readonly [string, string]> = [
  ['is', 'a state of the part'],
  ['position', 'a cylinder position in mm'],
  ['speed', 'a cylinder speed in mm/s'],
];

const MAX_ITEMS = 8;

/**
 * What may be typed at the caret: after `<tag> is`, that part's state words; after
 * `pressure at <tag>.`, its ports; otherwise the drawing's tags and the words that start or join
 * a formula. Matching is by prefix, case-insensitive; nothing is offered inside a comment or a
 * rule's quoted name, or when the word is already complete and the only match.
 */
export function completionAt(text: string, caret: number, vocabulary: readonly VocabularyEntry[]): Completion | null {
  const before = text.slice(0, caret);
  const wordMatch = /[A-Za-z0-9._-]*$/.exec(before);
  const word = wordMatch ? wordMatch[0] : '';
  const from = caret - word.length;
  const tokens = tokenizeRules(before.slice(0, from)).filter((t) => t.kind !== 'comment' || t.to < from);
  const last = tokens[tokens.length - 1];
  if (last && (last.kind === 'comment' || (last.kind === 'string' && !/"$/.test(last.text.slice(1))))) return null;
  const lineStart = before.lastIndexOf('\n') + 1;
  if (/^\s*#/.test(before.slice(lineStart)) || (before.slice(lineStart).match(/"/g)?.length ?? 0) % 2 === 1) return null;

  const previous = tokens.slice(-2).map((t) => t.text.toLowerCase());
  const byTag = new Map(vocabulary.map((v) => [v.tag.toLowerCase(), v]));
  let items: Suggestion[];
  const portOf = /pressure\s+at\s+([A-Za-z0-9._-]+)\.([A-Za-z0-9+-]*)$/i.exec(before);
  if (portOf) {
    const entry = byTag.get(portOf[1]!.toLowerCase());
    const portWord = portOf[2]!;
    const ports = entry ? entry.ports.filter((p) => p.toLowerCase().startsWith(portWord.toLowerCase())) : [];
    return ports.length ? { from: caret - portWord.length, to: caret, items: ports.slice(0, MAX_ITEMS).map((p) => ({ label: p, insert: p, detail: `port of ${entry!.tag}` })) } : null;
  }
  if (previous[1] === 'is' && previous[0] !== undefined && byTag.has(previous[0])) {
    const entry = byTag.get(previous[0])!;
    items = entry.words.map((w) => ({ label: w, insert: w, detail: `state of ${entry.tag}` }));
  } else if (previous[1] === 'is' || previous[1] === 'not' && previous[0] === 'is') {
    return null;
  } else if (last?.kind === 'tag') {
    items = AFTER_TAG.map(([w, d]) => ({ label: w, insert: w, detail: d }));
  } else {
    const afterOperand = last !== undefined && (last.kind === 'word' || last.text === ')' || last.kind === 'unit');
    items = afterOperand
      ? CONNECTIVES.map(([w, d]) => ({ label: w, insert: w, detail: d }))
      : [...vocabulary.map((v) => ({ label: v.tag, insert: v.tag, detail: v.label })), ...STARTERS.map(([w, d]) => ({ label: w, insert: w, detail: d }))];
  }
  const prefix = word.toLowerCase();
  const matching = items.filter((s) => s.insert.toLowerCase().startsWith(prefix));
  if (matching.length === 0 || (matching.length === 1 && matching[0]!.insert.toLowerCase() === prefix)) return null;
  if (prefix === '' && !/\s$/.test(before) && before.length > 0) return null;
  return { from, to: caret, items: matching.slice(0, MAX_ITEMS) };
}
