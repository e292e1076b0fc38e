import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { getRevision } from '@/lib/circuits/get-revision';
import { circuitIdSchema, revisionNumberSchema } from '@/lib/circuits/schemas';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string; number: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const { id, number } = await params;
  const circuitId = parseWith(circuitIdSchema, id, 'id');
  const revisionNumber = parseWith(revisionNumberSchema, number, 'number');
  return NextResponse.json(await getRevision({ workspaceId: actor.workspaceId, circuitId, number: revisionNumber }));
});
