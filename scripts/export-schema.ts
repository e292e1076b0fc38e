// `npm run schema:export`: writes the circuit document's JSON Schema to public/schema/.
import { mkdir, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { circuitJsonSchema } from '@/engine/document/json-schema';

const target = path.join(process.cwd(), 'public', 'schema', 'circuit.schema.json');

async function main(): Promise<void> {
  await mkdir(path.dirname(target), { recursive: true });
  await writeFile(target, `${JSON.stringify(circuitJsonSchema(), null, 2)}\n`);
  console.log(`wrote ${path.relative(process.cwd(), target)}`);
}

void main();
