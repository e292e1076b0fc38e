import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { runScenarioSuite } from '@/lib/proofs/scenario-runs';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:run');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  return NextResponse.json(await runScenarioSuite({ actor, circuitId }));
});
