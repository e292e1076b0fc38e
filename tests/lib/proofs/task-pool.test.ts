import { readFileSync } from 'node:fs';
import { afterAll, describe, expect, it } from 'vitest';
import type { CircuitDocument } from '@/engine/document/schema';
import { checkRules, compileRulesText } from '@/engine/proof/rules';
import { runProofTask, type ProofTask } from '@/engine/proof/search';
import { createTaskPool } from '@/lib/proofs/task-pool';

const document = JSON.parse(readFileSync('demo/circuits/lid-press-two-hand.json', 'utf8')) as CircuitDocument;
const rulesText = ['rule "1A1 stays in":', '  always 1A1 is retracted'].join('\n');

/** Paths of both buttons pressed at staggered times, long enough for the press to go out on some. */
const tasks: ProofTask[] = Array.from({ length: 9 }, (_, i) => ({
  inputs: [
    { t: 0, component: '1S1', action: 'press' },
    { t: (i % 3) * 0.25, component: '1S2', action: i < 3 ? 'press' : 'toggle' },
  ],
  untilS: 0.5 + 0.25 * (i % 4),
  signAtS: 0.25 * (i % 4),
}));

describe('proof task pool', () => {
  const pool = createTaskPool({ size: 2 });
  afterAll(() => pool.close());

  it('runs a batch in 2 threads with the rules compiled there, giving what the same paths give in this thread', async () => {
    const { rules, errors } = compileRulesText(rulesText, document);
    expect(errors).toEqual([]);
    const here = tasks.map((task) => runProofTask(document, task, (trace) => checkRules(rules, trace)));
    const threaded = await pool.runBatch(document, rulesText, tasks);
    expect(threaded).toEqual(here);
    // The batch is not trivial: the rule holds on some paths and breaks on others, and the end states differ.
    const holds = threaded.map((r) => r.verdicts[0]!.holds);
    expect(holds).toContain(true);
    expect(holds).toContain(false);
    expect(new Set(threaded.map((r) => r.signature)).size).toBeGreaterThan(3);
  }, 60_000);

  it('reports rules that do not compile as a rejected batch', async () => {
    await expect(pool.runBatch(document, 'rule "x":\n  always 9Z9 is extended', tasks.slice(0, 1))).rejects.toThrow(/rules do not compile: line 2/);
  }, 60_000);
});
