import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import type { Trace } from '@/engine/trace/trace';

const tsx = path.join(process.cwd(), 'node_modules', '.bin', 'tsx');
const sim = (...args: string[]) => spawnSync(tsx, ['scripts/sim.ts', ...args], { encoding: 'utf8' });

describe('sim CLI', () => {
  const demos = readdirSync('demo/circuits').filter((f) => f.endsWith('.json') && !f.endsWith('.inputs.json'));

  it.each(demos)('runs the demo circuit %s with its inputs and reaches both end positions', (file) => {
    const inputs = `demo/circuits/${file.replace('.json', '.inputs.json')}`;
    const out = execFileSync(tsx, ['scripts/sim.ts', `demo/circuits/${file}`, '--inputs', inputs, '--until', '3'], { encoding: 'utf8' });
    const trace = JSON.parse(out) as Trace;
    expect(trace.time.at(-1)).toBeCloseTo(3, 9);
    const ends = trace.events.filter((e) => e.kind === 'end-position').map((e) => e.detail);
    expect(ends).toContain('extended');
    expect(ends).toContain('retracted');
    expect(Math.abs(trace.stats.massBalanceErrorKg)).toBeLessThan(1e-12);
  });

  it('runs the relay-controlled press through one cycle: latch, extend, dwell on the sensor, return', () => {
    const out = execFileSync(tsx, ['scripts/sim.ts', 'demo/circuits/lid-press-relay-control.json', '--inputs', 'demo/circuits/lid-press-relay-control.inputs.json', '--until', '3'], { encoding: 'utf8' });
    const trace = JSON.parse(out) as Trace;
    const steps = trace.events.filter((e) => !e.kind.startsWith('input') && e.componentId !== 'lamp').map((e) => `${e.componentId} ${e.kind}${e.detail ? ` ${e.detail}` : ''}`);
    expect(steps).toEqual([
      'k1 energised',
      'k1 contacts-operated',
      'm1 energised',
      'main switched a',
      'press started extending',
      'down actuated',
      'kt1 energised',
      'press end-position extended',
      'kt1 contacts-operated',
      'k1 de-energised',
      'k1 contacts-returned',
      'm1 de-energised',
      'main switched b',
      'press started retracting',
      'down released',
      'kt1 de-energised',
      'kt1 contacts-returned',
      'press end-position retracted',
    ]);
    // The dwell: 0.5 s from the sensor seeing the press down to the timer ending the cycle.
    const t = (component: string, kind: string) => trace.events.find((e) => e.componentId === component && e.kind === kind)!.t;
    expect(t('kt1', 'contacts-operated') - t('down', 'actuated')).toBeCloseTo(0.5, 9);
  });

  it('prints CSV with a time column and labelled units', () => {
    const result = sim('demo/circuits/reject-gate-quick-exhaust.json', '--inputs', 'demo/circuits/reject-gate-quick-exhaust.inputs.json', '--until', '0.5', '--interval', '0.1', '--format', 'csv');
    expect(result.status).toBe(0);
    const lines = result.stdout.trim().split('\n');
    expect(lines[0]).toMatch(/^time_s,.*gate:x \[m\]/);
    expect(lines).toHaveLength(1 + 6);
  });

  it('exits 2 and names the component and field of an invalid document', () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'airproof-sim-'));
    const bad = path.join(dir, 'bad.json');
    writeFileSync(bad, JSON.stringify({ schemaVersion: 1, components: [{ id: 'c1', type: 'cylinder-double-acting', tag: '1A1', position: { x: 0, y: 'left' } }] }));
    const result = sim(bad, '--until', '1');
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('component 1A1 (components[0]).position.y');
    expect(result.stdout).toBe('');
  });

  it('exits 2 with the diagnostic when a document names an unknown component type', () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'airproof-sim-'));
    const unknown = path.join(dir, 'unknown.json');
    writeFileSync(unknown, JSON.stringify({ schemaVersion: 1, components: [{ id: 'x', type: 'teleporter', tag: '9Z9', position: { x: 0, y: 0 } }] }));
    const result = sim(unknown, '--until', '1');
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('unknown-component-type');
  });
});
