// `npx tsx scripts/make-demo-log.ts [--out <file.csv>]`
// Writes the demo field log of the Harrow Lane lid press (relay control) with a fictional fault:
// the meter-out flow control 1V2 closed to 0.35 of its drawn opening, so the lid closes slowly
// and reed sensor 1B2 comes late. Three press cycles, exported as a European data logger would:
// ISO 8601 timestamps, `;` separator, decimal comma, a row every 10 ms. The CSV is committed;
// run this again only when the demo circuit or the engine changes.
import { readFileSync, writeFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import type { CircuitDocument } from '@/engine/document/schema';
import { validateDocument } from '@/engine/document/validate';
import { mulberry32 } from '@/engine/replay';
import { compile } from '@/engine/solver/compile';
import type { InputEvent } from '@/engine/solver/simulate';
import { simulate } from '@/engine/solver/simulate';
import type { Trace } from '@/engine/trace/trace';
import { fail } from './cli-circuit';

const CIRCUIT = 'demo/circuits/lid-press-relay-control.json';
const OUT = 'demo/logs/lid-press-slow-close.csv';
/** The fault: the flow control's needle at this fraction of its drawn opening. */
const OPENING_FACTOR = 0.35;
const PRESSES_AT_S = [0.2, 4.2, 8.2];
const PRESS_FOR_S = 0.2;
const LOG_LENGTH_S = 12;
const ROW_INTERVAL_MS = 10;
/** Simulated finer than the log so edges can be moved by a few ms before they are sampled. */
const TRACE_INTERVAL_S = 0.001;
/** A logger's input filter and scan make an edge show up late by up to this much, ms. */
const MAX_EDGE_DELAY_MS = 5;
const SEED = 20261127;
const START_MS = Date.parse('2026-11-27T06:14:03.000Z');

/** Log column ← trace signal; states are 0/1, the pressure is bar gauge. */
const STATE_COLUMNS: ReadonlyArray<[column: string, signal: string]> = [
  ['S1_start', 'start:operated'],
  ['S2_stop', 'stop:operated'],
  ['1M1_valve', 'm1:energised'],
  ['1B2_down', 'down:actuated'],
];
const PRESSURE_COLUMN: [column: string, signal: string] = ['p_cap_bar', 'press:p:A'];

const { values } = parseArgs({ options: { out: { type: 'string', default: OUT } } });

const checked = validateDocument(JSON.parse(readFileSync(CIRCUIT, 'utf8')));
if (!checked.ok) fail(checked.messages);
const faulty = withThrottledFlowControl(checked.document, '1V2');
const { model, diagnostics } = compile(faulty);
if (!model) fail(diagnostics.map((d) => `${d.code}: ${d.message}`));

const inputs: InputEvent[] = PRESSES_AT_S.flatMap((t) => [
  { t, component: 'S1', action: 'press' },
  { t: t + PRESS_FOR_S, component: 'S1', action: 'release' },
]);
const trace = simulate(model, inputs, { untilS: LOG_LENGTH_S, intervalS: TRACE_INTERVAL_S });
writeFileSync(values.out!, toLoggerCsv(trace, checked.document.settings.ambientPressurePa));

function withThrottledFlowControl(document: CircuitDocument, tag: string): CircuitDocument {
  const target = document.components.find((c) => c.tag === tag);
  const drawn = target?.parameters.opening;
  if (typeof drawn !== 'number') fail([`${CIRCUIT}: ${tag} has no drawn opening`]);
  return {
    ...document,
    components: document.components.map((c) => (c === target ? { ...c, parameters: { ...c.parameters, opening: drawn * OPENING_FACTOR } } : c)),
  };
}

function toLoggerCsv(run: Trace, ambientPa: number): string {
  const random = mulberry32(SEED);
  const column = (name: string) => {
    const found = run.signals.find((s) => s.name === name);
    if (!found) fail([`the trace has no signal ${name}`]);
    return found.values;
  };
  const edges = STATE_COLUMNS.map(([, name]) => delayedEdges(column(name), random));
  const pressure = column(PRESSURE_COLUMN[1]);
  const rows = [['timestamp', ...STATE_COLUMNS.map(([name]) => name), PRESSURE_COLUMN[0]].join(';')];
  for (let ms = 0; ms <= LOG_LENGTH_S * 1000; ms += ROW_INTERVAL_MS) {
    const states = edges.map((e) => String(stateAt(e, ms)));
    const bar = (pressure[Math.round(ms / 1000 / TRACE_INTERVAL_S)]! - ambientPa) / 1e5;
    const gauge = (Math.abs(bar) < 0.05 ? 0 : bar).toFixed(1).replace('.', ',');
    rows.push([new Date(START_MS + ms).toISOString(), ...states, gauge].join(';'));
  }
  return `${rows.join('\n')}\n`;
}

interface Edges {
  initial: number;
  /** Each change: time in ms (already delayed) and the value after it. */
  changes: Array<{ ms: number; value: number }>;
}

function delayedEdges(samples: number[], random: () => number): Edges {
  const changes: Edges['changes'] = [];
  for (let i = 1; i < samples.length; i += 1) {
    if (samples[i] !== samples[i - 1]) changes.push({ ms: i * TRACE_INTERVAL_S * 1000 + random() * MAX_EDGE_DELAY_MS, value: samples[i]! });
  }
  return { initial: samples[0]!, changes };
}

function stateAt(edges: Edges, ms: number): number {
  let value = edges.initial;
  for (const change of edges.changes) if (change.ms <= ms) value = change.value;
  return value;
}
