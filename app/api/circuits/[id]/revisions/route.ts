import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { appendRevision } from '@/lib/circuits/append-revision';
import { listRevisions } from '@/lib/circuits/list-revisions';
import { appendRevisionBodySchema, circuitIdSchema, listRevisionsQuerySchema } from '@/lib/circuits/schemas';
import { parseSearchParams, parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const query = parseSearchParams(request, listRevisionsQuerySchema);
  return NextResponse.json(await listRevisions({ workspaceId: actor.workspaceId, circuitId, query }));
});

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:edit');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, appendRevisionBodySchema);
  const saved = await appendRevision({ workspaceId: actor.workspaceId, circuitId, authorId: actor.userId, ...input });
  return NextResponse.json(saved, { status: 201 });
});
