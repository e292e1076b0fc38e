import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { parseSearchParams, parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { listProofs, startProof } from '@/lib/proofs/proofs';
import { listProofsQuerySchema, startProofBodySchema } from '@/lib/proofs/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const query = parseSearchParams(request, listProofsQuerySchema);
  return NextResponse.json(await listProofs({ workspaceId: actor.workspaceId, circuitId, query }));
});

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'proof:run');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, startProofBodySchema);
  return NextResponse.json(await startProof({ actor, circuitId, input }), { status: 202 });
});
