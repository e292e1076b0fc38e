import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { compareRevisions } from '@/lib/circuits/compare-revisions';
import { circuitIdSchema, compareQuerySchema } from '@/lib/circuits/schemas';
import { parseSearchParams, parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const query = parseSearchParams(request, compareQuerySchema);
  return NextResponse.json(await compareRevisions({ workspaceId: actor.workspaceId, circuitId, ...query }));
});
