import { describe, expect, it } from 'vitest';
import { bindRules, compileRulesText, parseRules, ruleVocabulary } from '@/engine/proof/rules';
import { testDocument } from './fixtures';

const doc = testDocument();
const errorsOf = (text: string) => compileRulesText(text, doc).errors;

describe('bindRules', () => {
  it('binds atoms to trace signals and lists the tags read', () => {
    const { rules, errors } = compileRulesText('rule "r": always (A is pressed and pressure at 0Z1.2 > 1 bar implies 1A1 is extending or 1V1 is a)', doc);
    expect(errors).toEqual([]);
    expect(rules[0]!.signals).toEqual(['a:operated', 'sup:p:2', 'cyl:v', 'v:position']);
    expect(rules[0]!.tags).toEqual(['A', '0Z1', '1A1', '1V1']);
  });

  it('resolves a tag with dots and a port after it by the longest tag that fits', () => {
    const { rules, errors } = compileRulesText('rule "r": K1.1 is closed and pressure at 1V1.14 < 1 bar', doc);
    expect(errors).toEqual([]);
    expect(rules[0]!.signals).toEqual(['k:closed', 'v:p:14']);
  });

  it('reports an unknown tag at its place, with the drawing tags', () => {
    expect(errorsOf('rule "r":\n  always 1A2 is extended')).toEqual([
      { line: 2, column: 10, message: "unknown tag '1A2'; the drawing's tags are A, B, C, M, 1A1, 0Z1, 1V1, 1M1, 1M2, 2A1, K1.1, 1S1, S0, G1" },
    ]);
    expect(errorsOf('rule "r": always 1a1 is extended')[0]!.message).toMatch(/^unknown tag '1a1' \(did you mean '1A1'\?\)/);
  });

  it('reports a state word the type does not have at the tag, with the valid ones', () => {
    expect(errorsOf('rule "r": always 1A1 is pressed')).toEqual([
      { line: 1, column: 18, message: "'1A1' is a double-acting cylinder: after 'is' write retracted, extended, extending, retracting, moving or still; found 'pressed'" },
    ]);
    expect(errorsOf('rule "r": S0 is pressed')[0]!.message).toBe("'S0' is an emergency stop: after 'is' write struck or ready; found 'pressed'");
    expect(errorsOf('rule "r": 1V1 is open')[0]!.message).toBe("'1V1' is a 5/2 valve: after 'is' write a, b or switched; found 'open'");
    expect(errorsOf('rule "r": 2A1 is extended')[0]!.message).toBe("'2A1' is a semi-rotary actuator: after 'is' write at start, at end, turning out, turning back, turning or still; found 'extended'");
    expect(errorsOf('rule "r": G1 is on')[0]!.message).toBe("'G1' (dc control supply) has no states a rule can name; found 'is on'");
  });

  it('reports an unknown port with the valid ones, and a port on a part without air', () => {
    expect(errorsOf('rule "r": pressure at 1A1.C > 1 bar')).toEqual([{ line: 1, column: 23, message: "'1A1' has no air port 'C'; its ports are A or B" }]);
    expect(errorsOf('rule "r": pressure at A.13 > 1 bar')[0]!.message).toBe("'A' has no air ports, so it has no pressure");
    expect(errorsOf('rule "r": pressure at 9Z9.2 > 1 bar')[0]!.message).toMatch(/^unknown tag '9Z9'/);
  });

  it('checks measures and their units against the type', () => {
    expect(errorsOf('rule "r": A position > 3 mm')[0]!.message).toMatch(/^'A' is a push-button, normally open: it has no position/);
    expect(errorsOf('rule "r": 1A1 speed > 3 deg/s')).toEqual([{ line: 1, column: 25, message: "expected the unit mm/s for the speed of '1A1', found 'deg/s'" }]);
    expect(errorsOf('rule "r": 2A1 position > 3 mm')[0]!.message).toBe("'2A1' is a semi-rotary actuator: it has no position; use 'angle' and 'speed'");
    expect(errorsOf('rule "r": pressure at 1A1.A > 3 mm')[0]!.message).toBe("expected the unit bar (gauge) for a pressure, found 'mm'");
  });

  it('binds the good rules and reports each bad one, merged with syntax errors in text order', () => {
    const text = ['rule "ok": always A is released', 'rule "bad tag": always Z9 is on', 'rule "syntax" always', 'rule "bad word": B is struck'].join('\n');
    const { rules, errors } = compileRulesText(text, doc);
    expect(rules.map((r) => r.name)).toEqual(['ok']);
    expect(errors.map((e) => e.line)).toEqual([2, 3, 4]);
    expect(bindRules(parseRules(text).rules, doc).rules).toHaveLength(1);
  });
});

describe('ruleVocabulary', () => {
  it('lists the words and air ports of each part a rule can name', () => {
    const entries = ruleVocabulary(doc);
    const byTag = new Map(entries.map((e) => [e.tag, e]));
    expect(byTag.get('1A1')).toEqual({ tag: '1A1', type: 'cylinder-double-acting', label: 'Double-acting cylinder', words: ['retracted', 'extended', 'extending', 'retracting', 'moving', 'still'], ports: ['A', 'B'] });
    expect(byTag.get('1S1')!.words).toEqual(['open', 'exhausting', 'switched', 'pressed', 'released']);
    expect(byTag.get('1M1')!.words).toEqual(['on', 'off', 'energised', 'de-energised']);
    expect(byTag.get('K1.1')!.words).toEqual(['closed', 'open']);
    expect(byTag.get('0Z1')).toMatchObject({ words: [], ports: ['2'] });
    // The DC supply has neither states nor air ports.
    expect(byTag.has('G1')).toBe(false);
    // Every word offered binds.
    for (const entry of entries) {
      for (const word of entry.words) expect(errorsOf(`rule "r": ${entry.tag} is ${word}`)).toEqual([]);
      for (const port of entry.ports) expect(errorsOf(`rule "r": pressure at ${entry.tag}.${port} > 1 bar`)).toEqual([]);
    }
  });
});
