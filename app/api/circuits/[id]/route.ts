import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { getCircuit } from '@/lib/circuits/get-circuit';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  return NextResponse.json(await getCircuit({ workspaceId: actor.workspaceId, circuitId }));
});
