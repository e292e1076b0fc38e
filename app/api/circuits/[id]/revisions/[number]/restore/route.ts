import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { restoreRevision } from '@/lib/circuits/restore-revision';
import { circuitIdSchema, restoreRevisionBodySchema, revisionNumberSchema } from '@/lib/circuits/schemas';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string; number: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:edit');
  const { id, number } = await params;
  const circuitId = parseWith(circuitIdSchema, id, 'id');
  const revisionNumber = parseWith(revisionNumberSchema, number, 'number');
  const input = await readJsonBody(request, restoreRevisionBodySchema);
  const saved = await restoreRevision({ workspaceId: actor.workspaceId, circuitId, authorId: actor.userId, number: revisionNumber, ...input });
  return NextResponse.json(saved, { status: 201 });
});
