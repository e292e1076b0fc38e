import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { listReplays } from '@/lib/replays/replays';
import { logIdSchema } from '@/lib/uploads/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const uploadId = parseWith(logIdSchema, (await params).id, 'id');
  return NextResponse.json({ items: await listReplays({ workspaceId: actor.workspaceId, uploadId }) });
});
