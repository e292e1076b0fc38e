// `npm run --silent sim -- <circuit.json> --inputs <inputs.json> --until <s> [--interval <s>] [--format json|csv]`
// Prints the trace of a simulation to standard output. An invalid document or
// inputs file prints the problems to standard error and exits with status 2.
import { readFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { validateDocument } from '@/engine/document/validate';
import { compile } from '@/engine/solver/compile';
import { inputEventsSchema } from '@/engine/solver/inputs';
import { simulate } from '@/engine/solver/simulate';
import { traceToCsv } from '@/engine/trace/trace';

const USAGE = 'usage: npm run --silent sim -- <circuit.json> --inputs <inputs.json> --until <seconds> [--interval <seconds>] [--format json|csv]';

function fail(messages: string[], status = 2): never {
  for (const m of messages) process.stderr.write(`${m}\n`);
  process.exit(status);
}

function readJson(path: string, what: string): unknown {
  try {
    return JSON.parse(readFileSync(path, 'utf8'));
  } catch (error) {
    return fail([`cannot read ${what} ${path}: ${error instanceof Error ? error.message : String(error)}`]);
  }
}

const { values, positionals } = parseArgs({
  allowPositionals: true,
  options: {
    inputs: { type: 'string' },
    until: { type: 'string' },
    interval: { type: 'string', default: '0.01' },
    format: { type: 'string', default: 'json' },
  },
});

const circuitPath = positionals[0];
const until = Number(values.until);
const interval = Number(values.interval);
if (!circuitPath || !(until > 0) || !(interval > 0) || !['json', 'csv'].includes(values.format ?? '')) fail([USAGE]);

const validation = validateDocument(readJson(circuitPath, 'circuit'));
if (!validation.ok) fail(validation.messages.map((m) => `${circuitPath}: ${m}`));

const rawInputs = values.inputs ? readJson(values.inputs, 'inputs') : [];
const inputs = inputEventsSchema.safeParse(rawInputs);
if (!inputs.success) fail(inputs.error.issues.map((i) => `${values.inputs}: [${i.path.join('.')}] ${i.message}`));

const { model, diagnostics } = compile(validation.document);
for (const d of diagnostics.filter((x) => x.severity === 'warning')) process.stderr.write(`warning ${d.code}: ${d.message}\n`);
if (!model) fail(diagnostics.filter((d) => d.severity === 'error').map((d) => `error ${d.code}: ${d.message}`));

const trace = simulate(model, inputs.data, { untilS: until, intervalS: interval });
process.stdout.write(values.format === 'csv' ? traceToCsv(trace) : `${JSON.stringify(trace)}\n`);
