import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { getLogDetail } from '@/lib/replays/log-detail';
import { logIdSchema } from '@/lib/uploads/schemas';
import { deleteLogUpload } from '@/lib/uploads/uploads';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const uploadId = parseWith(logIdSchema, (await params).id, 'id');
  return NextResponse.json(await getLogDetail({ workspaceId: actor.workspaceId, uploadId }));
});

/** Uploaders delete their own logs and owners any (the service checks which). */
export const DELETE = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'upload:create');
  const uploadId = parseWith(logIdSchema, (await params).id, 'id');
  await deleteLogUpload({ actor, uploadId });
  return NextResponse.json({ ok: true });
});
