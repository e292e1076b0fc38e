import { readFileSync } from 'node:fs';
import type { NextRequest } from 'next/server';
import { circuitDocumentSchema, type CircuitDocument } from '@/engine/document/schema';
import type { InputEvent } from '@/engine/solver/simulate';
import { apiRequest } from './fixtures';

export interface RouteAnswer<T = unknown> {
  status: number;
  json: T;
}

/** Calls a route handler of an `[id]` route as Next would, as the given user, and reads the JSON answer. */
export async function callRoute<T = unknown>(
  handler: (request: NextRequest, context: { params: Promise<{ id: string }> }) => Promise<Response>,
  path: string,
  { userId, method = 'GET', body, id }: { userId?: string; method?: string; body?: object; id: string },
): Promise<RouteAnswer<T>> {
  const response = await handler(await apiRequest(path, { userId, method, body }), { params: Promise.resolve({ id }) });
  return { status: response.status, json: (await response.json()) as T };
}

/** The demo lid press with its two-hand start (demo/circuits), and the inputs of its demo run. */
export function lidPress(): { document: CircuitDocument; inputs: InputEvent[] } {
  return {
    document: circuitDocumentSchema.parse(JSON.parse(readFileSync('demo/circuits/lid-press-two-hand.json', 'utf8'))),
    inputs: JSON.parse(readFileSync('demo/circuits/lid-press-two-hand.inputs.json', 'utf8')) as InputEvent[],
  };
}
