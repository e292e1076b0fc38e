import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { listLogMappings } from '@/lib/replays/mappings';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  return NextResponse.json({ items: await listLogMappings({ workspaceId: actor.workspaceId, circuitId }) });
});
