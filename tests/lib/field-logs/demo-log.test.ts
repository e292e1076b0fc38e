import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { ruleVocabulary } from '@/engine/proof/rules';
import { compile } from '@/engine/solver/compile';
import { simulate } from '@/engine/solver/simulate';
import { applyMapping } from '@/lib/field-logs/apply-mapping';
import { suggestMapping } from '@/lib/field-logs/mapping';
import { parseLog } from '@/lib/field-logs/parse-log';
import { demoDocument } from '@/tests/support/demo-circuits';

const document = demoDocument('lid-press-relay-control');

const risingEdges = (times: number[], values: number[]) => times.filter((_, i) => values[i] === 1 && i > 0);

describe('the demo field log (demo/logs/lid-press-slow-close.csv)', () => {
  const parsed = parseLog(new Uint8Array(readFileSync('demo/logs/lid-press-slow-close.csv')), 'lid-press-slow-close.csv');

  it('reads as a European logger export: semicolons, decimal commas, ISO 8601 times, a row every 10 ms', () => {
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    expect(parsed.table).toMatchObject({ format: 'csv', separator: ';', decimalComma: true, timeColumnGuess: 'timestamp', timeFormatGuess: 'iso8601' });
    expect(parsed.table.columns).toEqual(['timestamp', 'S1_start', 'S2_stop', '1M1_valve', '1B2_down', 'p_cap_bar']);
    expect(parsed.table.rows).toHaveLength(1201);
    expect(parsed.table.rows[0]![0]).toBe('2026-11-27T06:14:03.000Z');
  });

  it('maps with the suggested mapping without errors, and shows 1B2 arriving late on every cycle', () => {
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.errors));
    const mapping = suggestMapping(parsed.table, ruleVocabulary(document));
    expect(mapping.columns.map((c) => [c.column, c.tag, c.word, c.role, c.unit])).toEqual([
      ['S1_start', 'S1', 'pressed', 'command', undefined],
      ['S2_stop', 'S2', 'pressed', 'command', undefined],
      ['1M1_valve', '1M1', 'on', 'command', undefined],
      ['1B2_down', '1B2', 'on', 'observation', undefined],
      ['p_cap_bar', '1A1', 'pressure:A', 'observation', 'bar-gauge'],
    ]);
    const result = applyMapping(parsed.table, mapping, { ambientPa: document.settings.ambientPressurePa });
    if (!result.ok) throw new Error(JSON.stringify(result.errors));
    expect(result.log.durationS).toBe(12);
    expect(result.warnings.map((w) => w.column)).toEqual(['S2_stop']);

    const [s1, , m1, b2, p] = result.log.signals;
    const presses = risingEdges(s1!.times, s1!.values);
    expect(presses.map((t) => Math.round(t * 10) / 10)).toEqual([0.2, 4.2, 8.2]);
    expect(Math.max(...p!.values)).toBeCloseTo(document.settings.ambientPressurePa + 6e5, -4);

    // The same press cell as drawn: the lid is down this long after the solenoid.
    const { model } = compile(document);
    const healthy = simulate(model!, [{ t: 0.2, component: 'S1', action: 'press' }, { t: 0.4, component: 'S1', action: 'release' }], { untilS: 3 });
    const healthyS = healthy.events.find((e) => e.componentId === 'down' && e.kind === 'actuated')!.t - healthy.events.find((e) => e.componentId === 'm1' && e.kind === 'energised')!.t;
    const lateS = risingEdges(b2!.times, b2!.values).map((t, i) => t - risingEdges(m1!.times, m1!.values)[i]!);
    expect(lateS).toHaveLength(3);
    for (const late of lateS) expect(late).toBeGreaterThan(2 * healthyS);
  });
});
