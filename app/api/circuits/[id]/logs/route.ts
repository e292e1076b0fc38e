import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { parseSearchParams, parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { listLogsQuerySchema, logFileNameSchema } from '@/lib/uploads/schemas';
import { createLogUpload, listLogUploads } from '@/lib/uploads/uploads';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const query = parseSearchParams(request, listLogsQuerySchema);
  return NextResponse.json(await listLogUploads({ workspaceId: actor.workspaceId, circuitId, query }));
});

/** The body is the file itself; its name comes in `x-file-name` (percent-encoded when not ASCII) or `?name=`. */
function sentFileName(request: NextRequest): string {
  const header = request.headers.get('x-file-name');
  let name = header ?? request.nextUrl.searchParams.get('name') ?? '';
  if (header) {
    try {
      name = decodeURIComponent(header);
    } catch {
      // A name with a bare % that is not an escape is kept as sent.
    }
  }
  return parseWith(logFileNameSchema, name, 'fileName');
}

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'upload:create');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const fileName = sentFileName(request);
  return NextResponse.json(await createLogUpload({ actor, circuitId, fileName, request }), { status: 201 });
});
