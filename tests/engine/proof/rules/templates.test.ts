import { describe, expect, it } from 'vitest';
import carton from '@/demo/circuits/carton-clamp-sequence.json';
import relay from '@/demo/circuits/lid-press-relay-control.json';
import reject from '@/demo/circuits/reject-gate-quick-exhaust.json';
import twoHand from '@/demo/circuits/lid-press-two-hand.json';
import twoHandInputs from '@/demo/circuits/lid-press-two-hand.inputs.json';
import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';
import { checkRules, compileRulesText, ruleTemplates } from '@/engine/proof/rules';
import { compile } from '@/engine/solver/compile';
import { simulate, type InputEvent } from '@/engine/solver/simulate';
import { testDocument } from './fixtures';

const demos: Record<string, CircuitDocument> = {
  'lid-press-two-hand': circuitDocumentSchema.parse(twoHand),
  'lid-press-relay-control': circuitDocumentSchema.parse(relay),
  'carton-clamp-sequence': circuitDocumentSchema.parse(carton),
  'reject-gate-quick-exhaust': circuitDocumentSchema.parse(reject),
};

function run(document: CircuitDocument, inputs: readonly InputEvent[], untilS: number) {
  const { model, diagnostics } = compile(document);
  expect(diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
  return simulate(model!, inputs, { untilS, intervalS: 0.01 });
}

describe('ruleTemplates', () => {
  it.each(Object.keys(demos))('%s: every template parses and binds', (name) => {
    const templates = ruleTemplates(demos[name]!);
    expect(templates.length).toBeGreaterThan(0);
    for (const template of templates) {
      const { rules, errors } = compileRulesText(template.text, demos[name]!);
      expect(errors, template.id).toEqual([]);
      expect(rules.length, template.id).toBeGreaterThan(0);
    }
  });

  it('offers only the templates whose parts the drawing has', () => {
    expect(ruleTemplates(demos['lid-press-two-hand']!).map((t) => t.id)).toEqual(['two-hand-1A1', 'loss-of-air', 'stroke-watchdog']);
    // One start button and a stop button: no two-hand control; a DC supply and a solenoid: the power template.
    expect(ruleTemplates(demos['lid-press-relay-control']!).map((t) => t.id)).toEqual(['loss-of-air', 'loss-of-power', 'stroke-watchdog']);
    // Two coils on 1V1, sides 14 and 12: the exclusive-solenoid template; 1V1 returns by solenoid, so no return-by-spring rule.
    const doc = testDocument();
    const ids = ruleTemplates(doc).map((t) => t.id);
    expect(ids).toContain('exclusive-solenoids-1V1');
    expect(ruleTemplates(doc).find((t) => t.id === 'exclusive-solenoids-1V1')!.text).toContain('exclusive (1M1 is on, 1M2 is on)');
    expect(ruleTemplates(doc).find((t) => t.id === 'loss-of-power')!.text).not.toContain('1V1 returns');
  });

  it('writes the two-hand rules with the drawing tags', () => {
    const template = ruleTemplates(demos['lid-press-two-hand']!)[0]!;
    expect(template).toMatchObject({ title: 'Two-hand control of 1A1 (ISO 13851)', basis: 'ISO 13851 two-hand control' });
    expect(template.text).toContain('1A1 is extending only after together within 0.5 s (1S1 is pressed, 1S2 is pressed) within 0.3 s');
    expect(template.text).toContain('always (1A1 is extending implies once within 0.3 s (1S1 is pressed and 1S2 is pressed))');
  });
});

describe('two-hand rule on simulated runs of the lid press', () => {
  const document = demos['lid-press-two-hand']!;
  const { rules, errors } = compileRulesText(ruleTemplates(document)[0]!.text, document);
  const synchronous = rules[0]!;

  it('passes with the demo inputs (both buttons 0.15 s apart)', () => {
    expect(errors).toEqual([]);
    const verdicts = checkRules(rules, run(document, twoHandInputs as InputEvent[], 4));
    expect(verdicts.map((v) => [v.name, v.holds])).toEqual([
      [synchronous.name, true],
      [rules[1]!.name, true],
    ]);
  });

  it('fails when the second hand comes 2 s after the first', () => {
    const inputs: InputEvent[] = [
      { t: 0.2, component: '1S1', action: 'press' },
      { t: 2.2, component: '1S2', action: 'press' },
      { t: 4, component: '1S1', action: 'release' },
      { t: 4, component: '1S2', action: 'release' },
    ];
    const trace = run(document, inputs, 5);
    // The circuit itself has no synchronism check: the AND valve lets the press move out.
    expect(Math.max(...trace.signals.find((s) => s.name === 'press:x')!.values)).toBeGreaterThan(0.09);
    const [verdict] = checkRules([synchronous], trace);
    expect(verdict!.holds).toBe(false);
    expect(verdict!.violatedAtS).toBeGreaterThan(2.2);
    expect(verdict!.violatedAtS).toBeLessThan(2.5);
    expect(verdict!.explanation).toMatch(/^1A1 started extending at 2\.\d+ s without 1S1 and 1S2 pressed together within 0\.5 s in the 0\.3 s before$/);
  });
});

describe('loss-of-energy templates on simulated runs of the relay-controlled press', () => {
  const document = demos['lid-press-relay-control']!;
  const byId = (id: string) => {
    const { rules, errors } = compileRulesText(ruleTemplates(document).find((t) => t.id === id)!.text, document);
    expect(errors).toEqual([]);
    return rules;
  };
  const start: InputEvent[] = [
    { t: 0.2, component: 'S1', action: 'press' },
    { t: 0.4, component: 'S1', action: 'release' },
  ];

  it('power lost mid-stroke: the spring-return valve goes back and nothing starts when power returns', () => {
    const trace = run(document, [...start, { t: 0.5, component: 'G1', action: 'set', parameter: 'power', value: 0 }, { t: 1.5, component: 'G1', action: 'set', parameter: 'power', value: 1 }], 3);
    expect(trace.events.some((e) => e.kind === 'power-lost')).toBe(true);
    expect(checkRules(byId('loss-of-power'), trace).map((v) => v.holds)).toEqual([true, true]);
  });

  it('air lost mid-stroke: the stroke runs down and nothing moves out afterwards', () => {
    const trace = run(document, [...start, { t: 0.5, component: '0Z1', action: 'set', parameter: 'pressure', value: 0 }], 3);
    expect(checkRules(byId('loss-of-air'), trace).map((v) => v.holds)).toEqual([true]);
  });

  it('the power rule catches a valve held over by a coil that was never switched off', () => {
    // 1M1 forced on by hand (`set` on the valve side a) while its coil stays off: the valve stays switched.
    const trace = run(document, [{ t: 0.2, component: '1V1', action: 'set', parameter: 'a', value: 1 }], 1.5);
    const [returns] = checkRules(byId('loss-of-power').slice(0, 1), trace);
    expect(returns!.holds).toBe(false);
    expect(returns!.violatedAtS).toBeGreaterThan(0.2);
  });
});
