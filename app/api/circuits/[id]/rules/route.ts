import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { getRules, saveRules } from '@/lib/proofs/rules';
import { putRulesBodySchema } from '@/lib/proofs/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  return NextResponse.json(await getRules({ workspaceId: actor.workspaceId, circuitId }));
});

export const PUT = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'rules:edit');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, putRulesBodySchema);
  return NextResponse.json(await saveRules({ actor, circuitId, input }));
});
