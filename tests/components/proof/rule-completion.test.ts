import { describe, expect, it } from 'vitest';
import { completionAt } from '@/components/proof/rule-completion';
import { ruleVocabulary } from '@/engine/proof/rules';
import { demoDocument } from '@/tests/support/demo-circuits';

const document = demoDocument('lid-press-two-hand');
const vocabulary = ruleVocabulary(document);

/** Completion with the caret at the end of the text. */
const at = (text: string) => completionAt(text, text.length, vocabulary);
const labels = (text: string) => at(text)?.items.map((i) => i.label) ?? [];

describe('completionAt', () => {
  it('offers the tags starting with what is typed, replacing just that word', () => {
    const c = at('rule "x":\n  always (1S');
    expect(c?.items.map((i) => i.label)).toEqual(['1S1', '1S2']);
    expect(c).toMatchObject({ from: 'rule "x":\n  always ('.length, to: 'rule "x":\n  always (1S'.length });
  });

  it("offers a part's own state words after `<tag> is`", () => {
    const words = vocabulary.find((v) => v.tag === '1A1')!.words;
    expect(words).toContain('extended');
    expect(labels('rule "x":\n  never 1A1 is ')).toEqual(words.slice(0, 8));
    expect(labels('rule "x":\n  never 1A1 is ext')).toEqual(words.filter((w) => w.startsWith('ext')));
  });

  it('offers the ports of the part named after `pressure at <tag>.`', () => {
    const ports = vocabulary.find((v) => v.tag === '1A1')!.ports;
    expect(ports.length).toBeGreaterThan(0);
    const c = at('rule "x":\n  always pressure at 1A1.');
    expect(c?.items.map((i) => i.label)).toEqual(ports.slice(0, 8));
    expect(c?.from).toBe(c?.to);
  });

  it('offers what may follow a tag, and the joining words after a finished atom', () => {
    expect(labels('rule "x":\n  never 1A1 ')).toEqual(['is', 'position', 'speed']);
    expect(labels('rule "x":\n  never 1A1 is extended ')).toEqual(['and', 'or', 'implies', 'until', 'only after', 'within']);
  });

  it('offers nothing inside a comment, inside a rule name, or once the word is complete and alone', () => {
    expect(at('# 1S')).toBeNull();
    expect(at('rule "1S')).toBeNull();
    expect(at('rule "x":\n  never 1S1')).toBeNull();
  });
});
