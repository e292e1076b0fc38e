// `npm run --silent prove -- <circuit.json> --rules <rules.txt> --vary 1S1:button,1S2:button[,B1:sensor-stuck-on,...]
//   [--quantum 0.25] [--steps 8] [--settle 1] [--threads N]`
// Searches every timing of the varied inputs and failures (engine/proof/search/README.md) and
// prints the search result as JSON. Rules that do not compile print "line:column message" to
// standard error and exit 2, as does an invalid circuit or variation.
import { parseArgs } from 'node:util';
import { checkRules, compileRulesText, longestWindowS } from '@/engine/proof/rules';
import { runProofSearch, VARIATION_KINDS, type Variation, type VariationKind } from '@/engine/proof/search';
import { createTaskPool } from '@/lib/proofs/task-pool';
import { fail, loadCircuit, readText } from './cli-circuit';

const USAGE =
  'usage: npm run --silent prove -- <circuit.json> --rules <rules.txt> --vary <tag>:<kind>[,<tag>:<kind>...] [--quantum <s>] [--steps <n>] [--settle <s>] [--threads <n>]\n' +
  `kinds: ${VARIATION_KINDS.join(', ')}`;

const CAUTION =
  'Caution: simulation results support, and never replace, a risk assessment under the applicable machinery-safety standards, local codes and a competent person\'s sign-off.';

function parseVariations(text: string): Variation[] {
  return text.split(',').map((item) => {
    const [tag, kind, ...rest] = item.trim().split(':');
    if (!tag || !kind || rest.length || !VARIATION_KINDS.includes(kind as VariationKind)) fail([`--vary: "${item}" is not <tag>:<kind>`, USAGE]);
    return { tag, kind: kind as VariationKind };
  });
}

async function main(): Promise<void> {
  const { values, positionals } = parseArgs({
    allowPositionals: true,
    options: {
      rules: { type: 'string' },
      vary: { type: 'string' },
      quantum: { type: 'string', default: '0.25' },
      steps: { type: 'string', default: '8' },
      settle: { type: 'string', default: '1' },
      threads: { type: 'string', default: '1' },
    },
  });
  const circuitPath = positionals[0];
  const [quantumS, steps, settleS, threads] = [Number(values.quantum), Number(values.steps), Number(values.settle), Number(values.threads)];
  if (!circuitPath || !values.rules || !values.vary || !(quantumS > 0) || !Number.isInteger(steps) || steps < 1 || !(settleS >= 0) || !Number.isInteger(threads) || threads < 1) fail([USAGE]);

  const { document } = loadCircuit(circuitPath);
  const rulesText = readText(values.rules, 'rules');
  const { rules, errors } = compileRulesText(rulesText, document);
  if (errors.length) fail(errors.map((e) => `${e.line}:${e.column} ${e.message}`));
  const variations = parseVariations(values.vary);

  const pool = threads > 1 ? createTaskPool({ size: threads }) : null;
  try {
    const result = await runProofSearch(
      { document, variations, quantumS, steps, settleS, historyS: longestWindowS(rules) },
      (trace) => checkRules(rules, trace),
      pool ? { runBatch: (tasks) => pool.runBatch(document, rulesText, tasks) } : {},
    );
    process.stdout.write(`${JSON.stringify(result)}\n`);
    process.stderr.write(`${CAUTION}\n`);
  } catch (error) {
    // A variation the drawing does not offer, or a search setting out of range.
    fail([error instanceof Error ? error.message : String(error)]);
  } finally {
    await pool?.close();
  }
}

void main();
