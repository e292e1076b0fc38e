import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseSearchParams, parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { listFaultSearches, startFaultSearch } from '@/lib/replays/fault-searches';
import { listFaultSearchesQuerySchema, onRevisionBodySchema } from '@/lib/replays/schemas';
import { logIdSchema } from '@/lib/uploads/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const uploadId = parseWith(logIdSchema, (await params).id, 'id');
  const query = parseSearchParams(request, listFaultSearchesQuerySchema);
  return NextResponse.json(await listFaultSearches({ workspaceId: actor.workspaceId, uploadId, query }));
});

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'replay:run');
  const uploadId = parseWith(logIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, onRevisionBodySchema);
  return NextResponse.json(await startFaultSearch({ actor, uploadId, input }), { status: 202 });
});
