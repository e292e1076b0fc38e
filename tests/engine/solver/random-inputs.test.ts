import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { circuitDocumentSchema } from '@/engine/document/schema';
import { compile } from '@/engine/solver/compile';
import { simulate, type InputEvent } from '@/engine/solver/simulate';
import { generatedCircuit, generatedElectroCircuit } from '@/scripts/bench/generated-circuits';

/** A small deterministic generator (Park–Miller), so a failure can be replayed. */
function generator(seed: number): () => number {
  let state = seed;
  return () => (state = (state * 16807) % 2147483647) / 2147483647;
}

/** Random presses, releases and toggles of the circuit's hand-operated parts, at random times. */
function randomInputs(targets: readonly string[], seed: number, untilS: number, count: number): InputEvent[] {
  const random = generator(seed);
  const actions = ['press', 'release', 'toggle'] as const;
  return Array.from({ length: count }, () => ({
    t: Math.round(random() * untilS * 1000) / 1000,
    component: targets[Math.floor(random() * targets.length)]!,
    action: actions[Math.floor(random() * actions.length)]!,
  }));
}

const MANUAL = /pushbutton|mushroom|lever|selector|emergency-stop/;

describe('random operation of whole circuits', () => {
  const demos = readdirSync('demo/circuits').filter((f) => f.endsWith('.json') && !f.endsWith('.inputs.json'));
  const documents = [
    ...demos.map((f) => ({ name: f, document: circuitDocumentSchema.parse(JSON.parse(readFileSync(`demo/circuits/${f}`, 'utf8'))) })),
    { name: 'generated pneumatic cells', document: generatedCircuit(30).document },
    { name: 'generated electro-pneumatic cells', document: generatedElectroCircuit(30).document },
  ];

  it.each(documents)('$name: any sequence of hand inputs runs to the end, deterministically, with the air budget closed', ({ document }) => {
    expect(() => {
      const { model } = compile(document);
      simulate(model!, [], { untilS: 0.01 });
      simulate(model!, [], { untilS: 0.01 });
    }).toThrow('runs once');
    const run = (inputs: InputEvent[]) => simulate(compile(document).model!, inputs, { untilS: 3, intervalS: 0.01 });
    const targets = document.components
      .filter((c) => MANUAL.test(c.type) || (typeof c.parameters.actuation === 'string' && MANUAL.test(c.parameters.actuation)))
      .map((c) => c.tag);
    expect(targets.length).toBeGreaterThan(0);
    for (const seed of [1, 2, 3]) {
      const inputs = randomInputs(targets, seed, 3, 30);
      const trace = run(inputs);
      expect(trace.time.at(-1)).toBeCloseTo(3, 9);
      expect(Math.abs(trace.stats.massBalanceErrorKg)).toBeLessThan(1e-12);
      const times = trace.events.map((e) => e.t);
      expect(times).toEqual([...times].sort((a, b) => a - b));
      expect(run(inputs)).toEqual(trace);
    }
  });
});
