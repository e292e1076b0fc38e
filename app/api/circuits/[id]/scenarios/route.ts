import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { createScenario, listScenarios } from '@/lib/proofs/scenarios';
import { createScenarioBodySchema } from '@/lib/proofs/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** Ten thousand inputs with their parameters can pass the default limit. */
const SCENARIO_BODY_LIMIT_BYTES = 2 * 1024 * 1024;

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  return NextResponse.json({ items: await listScenarios({ workspaceId: actor.workspaceId, circuitId }) });
});

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'scenario:edit');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, createScenarioBodySchema, SCENARIO_BODY_LIMIT_BYTES);
  return NextResponse.json(await createScenario({ actor, circuitId, input }), { status: 201 });
});
