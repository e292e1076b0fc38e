import { readFileSync, readdirSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { circuitJsonSchema } from '@/engine/document/json-schema';
import { circuitDocumentSchema, CURRENT_SCHEMA_VERSION, emptyDocument } from '@/engine/document/schema';

describe('circuit document schema', () => {
  it('fills defaults for an empty document', () => {
    expect(emptyDocument()).toEqual({
      schemaVersion: CURRENT_SCHEMA_VERSION,
      settings: { ambientPressurePa: 101_325, ambientTemperatureK: 293.15 },
      components: [],
      tubes: [],
      wires: [],
      links: [],
    });
  });

  it('names the component and field at fault', () => {
    const result = circuitDocumentSchema.safeParse({
      schemaVersion: 1,
      components: [{ id: 'ok', type: 'x', tag: '1A1', position: { x: 0, y: 0 } }, { id: 'bad id!', type: 'x', tag: '1A2', position: { x: 0, y: 0 } }],
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(['components', 1, 'id']);
  });

  it('accepts every demo circuit', () => {
    const dir = path.join(process.cwd(), 'demo', 'circuits');
    const files = readdirSync(dir).filter((f) => f.endsWith('.json') && !f.endsWith('.inputs.json'));
    expect(files.length).toBeGreaterThanOrEqual(3);
    for (const file of files) {
      const parsed = circuitDocumentSchema.safeParse(JSON.parse(readFileSync(path.join(dir, file), 'utf8')));
      expect(parsed.success, file).toBe(true);
    }
  });

  it('matches the published JSON Schema file', () => {
    const published: unknown = JSON.parse(readFileSync(path.join(process.cwd(), 'public', 'schema', 'circuit.schema.json'), 'utf8'));
    expect(published).toEqual(JSON.parse(JSON.stringify(circuitJsonSchema())));
  });
});
