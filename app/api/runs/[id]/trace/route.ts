import type { NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { openRunTrace } from '@/lib/runs/get-run';
import { runIdSchema } from '@/lib/runs/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const runId = parseWith(runIdSchema, (await params).id, 'id');
  const trace = await openRunTrace({ workspaceId: actor.workspaceId, runId });
  return new Response(trace, { headers: { 'content-type': 'application/json' } });
});
