import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { createCircuit } from '@/lib/circuits/create-circuit';
import { listCircuits } from '@/lib/circuits/list-circuits';
import { createCircuitBodySchema, listCircuitsQuerySchema } from '@/lib/circuits/schemas';
import { parseSearchParams, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const query = parseSearchParams(request, listCircuitsQuerySchema);
  return NextResponse.json(await listCircuits({ workspaceId: actor.workspaceId, query }));
});

export const POST = route(async (request: NextRequest) => {
  const actor = await authorizeRequest(request, 'circuit:create');
  const input = await readJsonBody(request, createCircuitBodySchema);
  const created = await createCircuit({ workspaceId: actor.workspaceId, authorId: actor.userId, input });
  return NextResponse.json(created, { status: 201 });
});
