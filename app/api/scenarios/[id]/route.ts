import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { deleteScenario, updateScenario } from '@/lib/proofs/scenarios';
import { scenarioIdSchema, updateScenarioBodySchema } from '@/lib/proofs/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

/** Ten thousand inputs with their parameters can pass the default limit. */
const SCENARIO_BODY_LIMIT_BYTES = 2 * 1024 * 1024;

export const PATCH = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'scenario:edit');
  const scenarioId = parseWith(scenarioIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, updateScenarioBodySchema, SCENARIO_BODY_LIMIT_BYTES);
  return NextResponse.json(await updateScenario({ actor, scenarioId, input }));
});

export const DELETE = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'scenario:edit');
  const scenarioId = parseWith(scenarioIdSchema, (await params).id, 'id');
  await deleteScenario({ actor, scenarioId });
  return NextResponse.json({ ok: true });
});
