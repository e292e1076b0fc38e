import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { SearchResult } from '@/engine/proof/search';

const tsx = path.join(process.cwd(), 'node_modules', '.bin', 'tsx');
const prove = (...args: string[]) => spawnSync(tsx, ['scripts/prove.ts', ...args], { encoding: 'utf8' });
const dir = mkdtempSync(path.join(os.tmpdir(), 'airproof-prove-'));
const file = (name: string, text: string) => {
  const at = path.join(dir, name);
  writeFileSync(at, text);
  return at;
};
const stayIn = file('stay-in.txt', 'rule "1A1 stays in":\n  always 1A1 is retracted\n');
const twoHand = 'demo/circuits/lid-press-two-hand.json';

describe('prove CLI', () => {
  it('prints the search result with the shortest counterexample, and the caution on standard error', () => {
    const result = prove(twoHand, '--rules', stayIn, '--vary', '1S1:button,1S2:button', '--quantum', '0.25', '--steps', '3');
    expect(result.status).toBe(0);
    const out = JSON.parse(result.stdout) as SearchResult;
    expect(out).toMatchObject({ complete: true, sequences: 4, levels: 1, quantumS: 0.25 });
    expect(out.rules).toHaveLength(1);
    expect(out.rules[0]).toMatchObject({ name: '1A1 stays in', status: 'failed' });
    expect(out.rules[0]!.counterexample!.inputs).toEqual([
      { t: 0, component: '1S1', action: 'press' },
      { t: 0, component: '1S2', action: 'press' },
    ]);
    expect(result.stderr).toContain('never replace, a risk assessment');
  }, 60_000);

  it('gives the same result in 2 threads as in one', () => {
    const passes = file('passes.txt', 'rule "1A1 out only with both":\n  always (1A1 is extending implies (1S1 is pressed and 1S2 is pressed))\n');
    const args = [twoHand, '--rules', passes, '--vary', '1S1:button,1S2:button', '--steps', '3', '--settle', '0.5'];
    const [one, two] = [prove(...args), prove(...args, '--threads', '2')];
    expect([one.status, two.status]).toEqual([0, 0]);
    const [a, b] = [JSON.parse(one.stdout) as SearchResult, JSON.parse(two.stdout) as SearchResult];
    expect({ ...b, elapsedS: 0 }).toEqual({ ...a, elapsedS: 0 });
    expect(a.sequences).toBeGreaterThan(4);
  }, 60_000);

  it('exits 2 with "line:column message" for rules that do not compile', () => {
    const bad = file('bad.txt', 'rule "x":\n  always 9Z9 is extended\n');
    const result = prove(twoHand, '--rules', bad, '--vary', '1S1:button');
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/^2:\d+ .*9Z9/m);
    expect(result.stdout).toBe('');
  }, 60_000);

  it('exits 2 and names what cannot be varied', () => {
    const result = prove(twoHand, '--rules', stayIn, '--vary', '1S1:button,1A1:sensor-stuck-on');
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('1A1 cannot vary as sensor-stuck-on');
    expect(prove(twoHand, '--rules', stayIn, '--vary', '1S1:wobble').status).toBe(2);
  }, 60_000);

  it('exits 2 with the validation messages of an invalid document', () => {
    const bad = file('bad.json', JSON.stringify({ schemaVersion: 1, components: [{ id: 'c1', type: 'cylinder-double-acting', tag: '1A1', position: { x: 0, y: 'left' } }] }));
    const result = prove(bad, '--rules', stayIn, '--vary', '1S1:button');
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('component 1A1 (components[0]).position.y');
    expect(result.stdout).toBe('');
  }, 60_000);
});
