import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { replayUploadedLog } from '@/lib/replays/replays';
import { onRevisionBodySchema } from '@/lib/replays/schemas';
import { logIdSchema } from '@/lib/uploads/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'replay:run');
  const uploadId = parseWith(logIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, onRevisionBodySchema);
  return NextResponse.json(await replayUploadedLog({ actor, uploadId, input }), { status: 201 });
});
