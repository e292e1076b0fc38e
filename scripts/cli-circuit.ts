// What the engine CLIs (sim, prove) share: failing with messages on standard error and status 2,
// reading JSON files, and loading a circuit that must validate and compile.
import { readFileSync } from 'node:fs';
import type { CircuitDocument } from '@/engine/document/schema';
import { validateDocument } from '@/engine/document/validate';
import { compile } from '@/engine/solver/compile';
import type { SolverModel } from '@/engine/solver/model';

export function fail(messages: string[], status = 2): never {
  for (const m of messages) process.stderr.write(`${m}\n`);
  process.exit(status);
}

export function readText(path: string, what: string): string {
  try {
    return readFileSync(path, 'utf8');
  } catch (error) {
    return fail([`cannot read ${what} ${path}: ${error instanceof Error ? error.message : String(error)}`]);
  }
}

export function readJson(path: string, what: string): unknown {
  try {
    return JSON.parse(readText(path, what));
  } catch (error) {
    return fail([`cannot read ${what} ${path}: ${error instanceof Error ? error.message : String(error)}`]);
  }
}

/**
 * Reads a circuit document: an invalid one prints its problems, one that does not compile its
 * error diagnostics, and both exit 2. Warnings go to standard error and the run goes on.
 */
export function loadCircuit(path: string): { document: CircuitDocument; model: SolverModel } {
  const validation = validateDocument(readJson(path, 'circuit'));
  if (!validation.ok) fail(validation.messages.map((m) => `${path}: ${m}`));
  const { model, diagnostics } = compile(validation.document);
  for (const d of diagnostics.filter((x) => x.severity === 'warning')) process.stderr.write(`warning ${d.code}: ${d.message}\n`);
  if (!model) fail(diagnostics.filter((d) => d.severity === 'error').map((d) => `error ${d.code}: ${d.message}`));
  return { document: validation.document, model };
}
