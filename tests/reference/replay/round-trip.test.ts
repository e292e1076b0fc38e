import { describe, expect, it } from 'vitest';
import { applyFault, faultsFor } from '@/engine/faults';
import { faultSearch, recordTrace, replayLog, type RecordedLog } from '@/engine/replay';
import type { InputEvent } from '@/engine/solver/simulate';
import type { CircuitDocument } from '@/engine/document/schema';
import { demoDocument } from '@/tests/support/demo-circuits';

/**
 * The check: a fault injected into the Harrow Lane lid press, simulated, written out as a
 * noisy field log and searched for against the healthy drawing must come back first, with its
 * severity within 15 %.
 */

const healthy = demoDocument('lid-press-relay-control');

/** Two press cycles: S1 tapped at 0.2 s and again at 2.5 s. */
const SCRIPT: InputEvent[] = [
  { t: 0.2, component: 'S1', action: 'press' },
  { t: 0.4, component: 'S1', action: 'release' },
  { t: 2.5, component: 'S1', action: 'press' },
  { t: 2.7, component: 'S1', action: 'release' },
];
const DURATION_S = 4.5;

function fieldLog(machine: CircuitDocument, seed: number): RecordedLog {
  // The log's own commands drive the machine, so the recorded run is exactly what a replay would give.
  const script: RecordedLog = { durationS: DURATION_S, signals: [{ tag: 'S1', word: 'pressed', role: 'command', kind: 'state', times: [0, 0.2, 0.4, 2.5, 2.7], values: [0, 1, 0, 1, 0] }] };
  const { trace, inputs } = replayLog(machine, script);
  expect(inputs.map((i) => [i.t, i.action])).toEqual(SCRIPT.map((i) => [i.t, i.action]));
  return recordTrace(
    machine,
    trace,
    inputs,
    {
      commands: [{ tag: 'S1', word: 'pressed' }],
      observations: [
        { tag: '1B2', word: 'on', kind: 'state' },
        { tag: '1M1', word: 'energised', kind: 'state' },
        { tag: '1A1', word: 'extended', kind: 'state' },
        { tag: '1A1', word: 'retracted', kind: 'state' },
        { tag: '1A1', word: 'pressure:A', kind: 'number' },
      ],
      durationS: DURATION_S,
    },
    // ±5 ms on edges and ±0.02 bar on pressures, as the issue asks (a logger's timestamp jitter and a transducer's noise).
    { seed, jitterS: 0.005, pressureNoisePa: 2_000 },
  );
}

async function searchFor(faultId: string, tag: string, severity: number, seed: number) {
  const log = fieldLog(applyFault(healthy, { faultId, tag, severity }), seed);
  const candidates = faultsFor(healthy);
  expect(candidates.some((c) => c.faultId === faultId && c.tag === tag)).toBe(true);
  const result = await faultSearch(healthy, log, { faults: candidates });
  return { result, candidates };
}

describe('round trip: inject a fault, record a noisy field log, find the fault', () => {
  it('finds the one-way flow control 1V2 opened to 40 % (drawn at 25 %)', async () => {
    const { result, candidates } = await searchFor('throttle-setting', '1V2', 0.4, 7);
    const best = result.candidates[0]!;
    expect(result.complete).toBe(true);
    expect(result.candidates).toHaveLength(candidates.length);
    expect([best.faultId, best.tag]).toEqual(['throttle-setting', '1V2']);
    expect(Math.abs(best.severity - 0.4) / 0.4).toBeLessThan(0.15);
    // The healthy drawing is clearly off (its strokes are slower by about 0.2 s), the fitted one close.
    expect(result.baseline.match).toBeLessThan(50);
    expect(best.match).toBeGreaterThan(90);
    expect(best.improvement).toBeGreaterThan(0);
    expect(best.explanation).toContain('1V2');
    expect(best.explanation).toContain('explains the log best');
  }, 120_000);

  it('finds a leaking piston seal on 1A1 and its conductance', async () => {
    const leak = 1.2e-9;
    const { result } = await searchFor('piston-seal-leak', '1A1', leak, 11);
    const best = result.candidates[0]!;
    expect([best.faultId, best.tag]).toEqual(['piston-seal-leak', '1A1']);
    expect(Math.abs(best.severity - leak) / leak).toBeLessThan(0.15);
    expect(best.match).toBeGreaterThan(result.baseline.match + 10);
    expect(best.severityUnit).toBe('m³/(s·Pa)');
  }, 120_000);
});
