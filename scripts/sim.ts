// `npm run --silent sim -- <circuit.json> --inputs <inputs.json> --until <s> [--interval <s>] [--format json|csv]`
// Prints the trace of a simulation to standard output. An invalid document or
// inputs file prints the problems to standard error and exits with status 2.
import { parseArgs } from 'node:util';
import { inputEventsSchema } from '@/engine/solver/inputs';
import { simulate } from '@/engine/solver/simulate';
import { traceToCsv } from '@/engine/trace/trace';
import { fail, loadCircuit, readJson } from './cli-circuit';

const USAGE = 'usage: npm run --silent sim -- <circuit.json> --inputs <inputs.json> --until <seconds> [--interval <seconds>] [--format json|csv]';

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

const { model } = loadCircuit(circuitPath);

const rawInputs = values.inputs ? readJson(values.inputs, 'inputs') : [];
const inputs = inputEventsSchema.safeParse(rawInputs);
if (!inputs.success) fail(inputs.error.issues.map((i) => `${values.inputs}: [${i.path.join('.')}] ${i.message}`));

const trace = simulate(model, inputs.data, { untilS: until, intervalS: interval });
process.stdout.write(values.format === 'csv' ? traceToCsv(trace) : `${JSON.stringify(trace)}\n`);
