import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { runScenario } from '@/lib/proofs/scenario-runs';
import { runScenarioBodySchema, scenarioIdSchema } from '@/lib/proofs/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:run');
  const scenarioId = parseWith(scenarioIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, runScenarioBodySchema);
  return NextResponse.json(await runScenario({ actor, scenarioId, revisionNumber: input?.revisionNumber }), { status: 201 });
});
