import { describe, expect, it } from 'vitest';
import type { CircuitDocument } from '@/engine/document/schema';
import { checkRules, compileRulesText, longestWindowS, ruleTemplates } from '@/engine/proof/rules';
import { runProofSearch, type SearchCheck } from '@/engine/proof/search';
import { demoDocument } from '@/tests/support/demo-circuits';

/** The template's ISO 13851 rules, written by Airproof for the drawing's own tags. */
function twoHandRules(document: CircuitDocument) {
  const template = ruleTemplates(document).find((t) => t.basis.includes('ISO 13851'));
  if (!template) throw new Error('no two-hand template for this drawing');
  const { rules, errors } = compileRulesText(template.text, document);
  expect(errors).toEqual([]);
  return rules;
}

async function search(name: string, buttons: [string, string]) {
  const document = demoDocument(name);
  const rules = twoHandRules(document);
  const check: SearchCheck = (trace) => checkRules(rules, trace);
  // A 0.3 s step keeps every press pair off the 0.5 s limit itself: 0.3 s apart is within it, 0.6 s is not.
  return runProofSearch(
    { document, variations: buttons.map((tag) => ({ tag, kind: 'button' as const })), quantumS: 0.3, steps: 5, settleS: 1, historyS: longestWindowS(rules) },
    check,
  );
}

// ISO 13851 (two-hand control devices), type III: the output may start only when both hands act
// within 0.5 s of each other (synchronous actuation), and again only after both have let go.
describe('the ISO 13851 synchronous-start rule over every press timing of the demo two-hand presses', () => {
  it('breaks on the press built with only a two-pressure valve: one hand, then the other more than 0.5 s later', async () => {
    const result = await search('lid-press-two-hand', ['1S1', '1S2']);
    expect(result.complete).toBe(true);
    const synchronous = result.rules.find((r) => r.name.includes('two-hand start'))!;
    expect(synchronous.status).toBe('failed');
    const presses = synchronous.counterexample!.inputs.filter((i) => i.action === 'press');
    expect(new Set(presses.map((p) => p.component))).toEqual(new Set(['1S1', '1S2']));
    const [first, second] = [...presses].sort((a, b) => a.t - b.t);
    expect(second!.t - first!.t).toBeGreaterThan(0.5);
  }, 60_000);

  it('holds on the press with the 0.5 s window relay, over every timing searched', async () => {
    const result = await search('lid-press-two-hand-timed', ['S1', 'S2']);
    expect(result.complete).toBe(true);
    expect(result.sequences).toBeGreaterThan(50);
    for (const rule of result.rules) expect({ rule: rule.name, status: rule.status, counterexample: rule.counterexample }).toEqual({ rule: rule.name, status: 'passed', counterexample: null });
  }, 120_000);
});
