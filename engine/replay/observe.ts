import type { CircuitDocument } from '../document/schema';
import { compileRulesText, formulaSeries } from '../proof/rules';
import type { Trace } from '../trace/trace';
import { ReplayError } from './errors';
import type { RecordedSignal } from './types';

/**
 * What the model says about one observed signal, read through the rule language's binding so
 * that "1B2 is on" means the same on the Replay page as in a proof.
 */

/** Where `<tag> is <word>` holds in the trace, sample by sample (1 holds). */
export function atomSeries(document: CircuitDocument, trace: Trace, tag: string, word: string): Uint8Array {
  const formula = bindOne(document, `${tag} is ${word}`, tag, word);
  const series = formulaSeries(formula, trace);
  if (!series) throw new ReplayError(`${tag} '${word}': the simulated trace has no signal for it`);
  return series;
}

/** The trace column for a number observation ('pressure:<port>' Pa absolute, 'position' m), or a constant where a port vents straight to atmosphere. */
export function numberSeries(document: CircuitDocument, trace: Trace, signal: RecordedSignal): { values: readonly number[] } | { constant: number } {
  const { tag, word } = signal;
  let text: string;
  if (word === 'position') text = `${tag} position > 0 mm`;
  else if (word.startsWith('pressure:') && word.length > 'pressure:'.length) text = `pressure at ${tag}.${word.slice('pressure:'.length)} > 0 bar`;
  else throw new ReplayError(`${tag} '${word}': a number can be 'position' (m) or 'pressure:<port>' (Pa absolute)`);
  const formula = bindOne(document, text, tag, word);
  if (formula.op !== 'atom') throw new ReplayError(`${tag} '${word}': not a single measure`);
  const atom = formula.atom;
  if (atom.signal === null) return { constant: atom.constant };
  const column = trace.signals.find((s) => s.name === atom.signal);
  if (!column) throw new ReplayError(`${tag} '${word}': the simulated trace has no signal '${atom.signal}'`);
  return { values: column.values };
}

function bindOne(document: CircuitDocument, atomText: string, tag: string, word: string) {
  const { rules, errors } = compileRulesText(`rule "replay": ${atomText}`, document);
  if (errors.length > 0 || rules.length !== 1) throw new ReplayError(`${tag} '${word}': ${errors[0]?.message ?? 'cannot be read from the drawing'}`);
  return rules[0]!.formula;
}
