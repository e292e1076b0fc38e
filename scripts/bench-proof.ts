// `npm run bench:proof`: how fast the interlock proof search runs and how its cost grows. Figures,
// not pass/fail. On the relay-controlled lid press (demo/circuits/lid-press-relay-control.json)
// with one rule, it prints (1) paths (sequences) per second in this thread and in a pool of 2
// engine threads, on the same search, with the CPU time the process used (a single engine thread
// already keeps more than one core partly busy with compiling and garbage collection), and (2) paths, distinct states and wall time for 1 to 4
// varied inputs at depths 2, 4 and 8. Each path is compiled and simulated from t = 0, so the
// time per path grows with the depth.
import { readFileSync } from 'node:fs';
import type { CircuitDocument } from '@/engine/document/schema';
import { checkRules, compileRulesText, longestWindowS } from '@/engine/proof/rules';
import { runProofSearch, type SearchOptions, type SearchResult, type Variation } from '@/engine/proof/search';
import { createTaskPool } from '@/lib/proofs/task-pool';

const CIRCUIT = 'demo/circuits/lid-press-relay-control.json';
const RULES = 'rule "solenoid off while the emergency stop is struck":\n  always (S0 is struck implies not 1M1 is energised)\n';
const VARIATIONS: Variation[] = [
  { tag: 'S1', kind: 'button' },
  { tag: 'S2', kind: 'button' },
  { tag: 'S0', kind: 'button' },
  { tag: 'G1', kind: 'power-loss' },
];
const QUANTUM_S = 0.25;
const SETTLE_S = 1;
/** Depth of the throughput search: four inputs to depth 5 is some 1 700 paths. */
const THROUGHPUT_DEPTH = 5;
const POOL_THREADS = 2;

const document = JSON.parse(readFileSync(CIRCUIT, 'utf8')) as CircuitDocument;
const { rules, errors } = compileRulesText(RULES, document);
if (errors.length) throw new Error(errors.map((e) => `${e.line}:${e.column} ${e.message}`).join('\n'));
const check = (trace: Parameters<typeof checkRules>[1]) => checkRules(rules, trace);

function search(variations: Variation[], steps: number, runBatch?: SearchOptions['runBatch']): Promise<SearchResult> {
  return runProofSearch({ document, variations, quantumS: QUANTUM_S, steps, settleS: SETTLE_S, historyS: longestWindowS(rules) }, check, runBatch ? { runBatch } : {});
}

const fixed = (x: number, digits: number) => x.toFixed(digits).padStart(8);

/** CPU time of the whole process (every thread, the JIT's and the garbage collector's included) since `from`. */
function cpuSecondsSince(from: NodeJS.CpuUsage): number {
  const used = process.cpuUsage(from);
  return (used.user + used.system) / 1e6;
}

async function main(): Promise<void> {
  console.log(`proof search on ${CIRCUIT}: quantum ${QUANTUM_S} s, settle ${SETTLE_S} s, rule "${rules[0]!.name}"`);
  // Warm the JIT up in this thread before timing it.
  await search(VARIATIONS, 2);

  console.log(`\nthroughput: ${VARIATIONS.length} inputs, depth ${THROUGHPUT_DEPTH}`);
  console.log('runner           paths    wall (s)   paths/s   cpu (s)');
  const line = (runner: string, r: SearchResult, cpuS: number) =>
    console.log(`${runner.padEnd(12)}  ${String(r.sequences).padStart(8)}  ${fixed(r.elapsedS, 2)}  ${fixed(r.sequences / r.elapsedS, 1)}  ${fixed(cpuS, 2)}`);
  let cpu = process.cpuUsage();
  const one = await search(VARIATIONS, THROUGHPUT_DEPTH);
  line('this thread', one, cpuSecondsSince(cpu));
  const pool = createTaskPool({ size: POOL_THREADS });
  try {
    await search(VARIATIONS, 2, (tasks) => pool.runBatch(document, RULES, tasks));
    cpu = process.cpuUsage();
    const pooled = await search(VARIATIONS, THROUGHPUT_DEPTH, (tasks) => pool.runBatch(document, RULES, tasks));
    line(`pool of ${POOL_THREADS}`, pooled, cpuSecondsSince(cpu));
  } finally {
    await pool.close();
  }

  console.log('\ngrowth (this thread):');
  console.log('inputs  depth     paths   states   wall (s)   paths/s');
  for (let inputs = 1; inputs <= VARIATIONS.length; inputs += 1) {
    for (const depth of [2, 4, 8]) {
      const r = await search(VARIATIONS.slice(0, inputs), depth);
      console.log(`${String(inputs).padStart(6)}  ${String(depth).padStart(5)}  ${String(r.sequences).padStart(8)}  ${String(r.states).padStart(7)}  ${fixed(r.elapsedS, 2)}  ${fixed(r.sequences / r.elapsedS, 1)}`);
    }
  }
}

void main();
