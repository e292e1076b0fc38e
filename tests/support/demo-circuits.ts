import { readFileSync } from 'node:fs';
import type { CircuitDocument } from '@/engine/document/schema';
import { validateDocument } from '@/engine/document/validate';
import type { InputEvent } from '@/engine/solver/simulate';

/** A demo circuit of the fictional plant (its file name in demo/circuits, without .json), read through the same checks as any stored drawing. */
export function demoDocument(name: string): CircuitDocument {
  const checked = validateDocument(JSON.parse(readFileSync(`demo/circuits/${name}.json`, 'utf8')));
  if (!checked.ok) throw new Error(`demo/circuits/${name}.json: ${checked.messages.join('; ')}`);
  return checked.document;
}

/** The timed inputs that come with a demo circuit (demo/circuits/<name>.inputs.json). */
export function demoInputs(name: string): InputEvent[] {
  return JSON.parse(readFileSync(`demo/circuits/${name}.inputs.json`, 'utf8')) as InputEvent[];
}
