import { z } from 'zod';
import { circuitDocumentSchema, CURRENT_SCHEMA_VERSION } from './schema';

/** The circuit document as JSON Schema (draft 2020-12), published at /schema/circuit.schema.json. */
export function circuitJsonSchema(): Record<string, unknown> {
  return {
    ...z.toJSONSchema(circuitDocumentSchema, { io: 'input' }),
    $id: `https://airproof.local/schema/circuit.v${CURRENT_SCHEMA_VERSION}.json`,
    title: 'Airproof circuit document',
    description: 'One revision of a pneumatic or electro-pneumatic circuit. SI units: Pa absolute, m, K, s.',
  };
}
