import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { createComment } from '@/lib/comments/create-comment';
import { listComments } from '@/lib/comments/list-comments';
import { createCommentBodySchema, listCommentsQuerySchema } from '@/lib/comments/schemas';
import { parseSearchParams, parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const query = parseSearchParams(request, listCommentsQuerySchema);
  return NextResponse.json({ threads: await listComments({ workspaceId: actor.workspaceId, circuitId, revisionNumber: query.revision }) });
});

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'comment:create');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, createCommentBodySchema);
  return NextResponse.json(await createComment({ actor, circuitId, input }), { status: 201 });
});
