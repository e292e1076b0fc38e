// `npm run bench:engine`: simulates generated circuits of about 10, 50 and 200
// components for 10 s of machine time and prints wall time, real-time factor and
// peak memory, then how cost grows with size. Figures, not pass/fail. Each size
// runs RUNS times; the first (cold: the JIT compiling), the best and the median of
// the others are shown, since a job or browser worker runs the engine warm. Cost
// growth is worked out from the medians. The wall time is
// the simulation with every row recorded in memory; turning the rows into one
// array per signal (the JSON form the CLI and the database take; a browser run
// streams rows instead) is timed apart.
import { getHeapStatistics } from 'node:v8';
import { compile } from '@/engine/solver/compile';
import { simulate } from '@/engine/solver/simulate';
import { MemoryTraceSink } from '@/engine/trace/trace';
import { generatedCircuit, generatedElectroCircuit } from './bench/generated-circuits';

const MACHINE_SECONDS = 10;
const SIZES = [10, 50, 200];
const RUNS = 15;
/**
 * Runs left out of the median: the JIT keeps optimising for several runs (a live run in the
 * browser goes on for minutes, so the warmed-up figure is the one that matters there).
 */
const WARM_UP = 5;

/**
 * Reads the heap every HEAP_EVERY rows. Through V8's heap statistics (about a microsecond):
 * process.memoryUsage() also reads the resident set size from the operating system, some 14 µs
 * a call here, which came to 1–2 % of a run's wall time.
 */
const HEAP_EVERY = 25;
const heapUsed = () => getHeapStatistics().used_heap_size;

class MeasuringSink extends MemoryTraceSink {
  peakHeapBytes = 0;
  private rows = 0;
  override sample(t: number, values: Float64Array): void {
    super.sample(t, values);
    if (this.rows++ % HEAP_EVERY === 0) this.peakHeapBytes = Math.max(this.peakHeapBytes, heapUsed());
  }
}

type Generator = typeof generatedCircuit;

interface Measured {
  components: number;
  wallS: number;
  columnsS: number;
  peakMiB: number;
  events: number;
}

function run(generate: Generator, size: number): Measured {
  const { document, inputs } = generate(size);
  const { model, diagnostics } = compile(document);
  if (!model) throw new Error(diagnostics.map((d) => d.message).join('\n'));
  const sink = new MeasuringSink();
  const started = performance.now();
  simulate(model, inputs, { untilS: MACHINE_SECONDS, intervalS: 0.01 }, sink);
  const simulated = performance.now();
  const trace = sink.toTrace(0.01, { steps: 0, rejectedSteps: 0, massBalanceErrorKg: 0 });
  const columnsS = (performance.now() - simulated) / 1000;
  sink.peakHeapBytes = Math.max(sink.peakHeapBytes, heapUsed());
  return { components: document.components.length, wallS: (simulated - started) / 1000, columnsS, peakMiB: sink.peakHeapBytes / 2 ** 20, events: trace.events.length };
}

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;
const factor = (wallS: number) => `${(MACHINE_SECONDS / wallS).toFixed(1)}×`;

function report(title: string, generate: Generator): void {
  const rows = SIZES.map((size) => {
    const runs = Array.from({ length: RUNS }, () => run(generate, size));
    const best = runs.reduce((a, b) => (b.wallS < a.wallS ? b : a));
    // The median leaves out the warm-up runs; the first is shown on its own (cold: the JIT still compiling).
    const warm = runs.slice(WARM_UP);
    return { ...best, medianS: median(warm.map((r) => r.wallS)), coldWallS: runs[0]!.wallS, columnsS: median(warm.map((r) => r.columnsS)), peakMiB: Math.max(...runs.map((r) => r.peakMiB)) };
  });
  console.log(`\n${title}: ${MACHINE_SECONDS} s of machine time, output every 10 ms, one core (Node ${process.version}), ${RUNS} runs a size`);
  console.log('components  best (s)  real-time factor  median (s)  factor  first run (s)  factor  rows to columns (s)  peak heap (MiB)  events');
  for (const r of rows) {
    console.log(
      [
        String(r.components).padStart(10),
        r.wallS.toFixed(3).padStart(8),
        factor(r.wallS).padStart(16),
        r.medianS.toFixed(3).padStart(11),
        factor(r.medianS).padStart(7),
        r.coldWallS.toFixed(3).padStart(13),
        factor(r.coldWallS).padStart(7),
        r.columnsS.toFixed(3).padStart(19),
        r.peakMiB.toFixed(1).padStart(15),
        String(r.events).padStart(6),
      ].join('  '),
    );
  }
  for (let i = 1; i < rows.length; i += 1) {
    const a = rows[i - 1]!;
    const b = rows[i]!;
    // Growth from the medians: a small circuit's best run is the one most flattered by caches and timing luck.
    const exponent = Math.log(b.medianS / a.medianS) / Math.log(b.components / a.components);
    console.log(`cost growth ${a.components} → ${b.components} components: median wall time × ${(b.medianS / a.medianS).toFixed(2)} for size × ${(b.components / a.components).toFixed(2)} (exponent ${exponent.toFixed(2)}; 1 = linear)`);
  }
}

report('Pneumatic cells (push-button valve pilots a 5/2 valve)', generatedCircuit);
report('Electro-pneumatic cells (push-button, relay, solenoid 5/2 valve)', generatedElectroCircuit);
