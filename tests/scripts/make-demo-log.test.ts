import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { expect, it } from 'vitest';

const tsx = path.join(process.cwd(), 'node_modules', '.bin', 'tsx');

it('make-demo-log writes the committed demo field log again, byte for byte', () => {
  const out = path.join(mkdtempSync(path.join(os.tmpdir(), 'demo-log-')), 'log.csv');
  execFileSync(tsx, ['scripts/make-demo-log.ts', '--out', out]);
  expect(readFileSync(out, 'utf8')).toBe(readFileSync('demo/logs/lid-press-slow-close.csv', 'utf8'));
}, 30_000);
