import type { NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { downloadHeaders } from '@/lib/uploads/download-headers';
import { logIdSchema } from '@/lib/uploads/schemas';
import { findLogUpload, readLogBytes } from '@/lib/uploads/uploads';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const uploadId = parseWith(logIdSchema, (await params).id, 'id');
  const upload = await findLogUpload({ workspaceId: actor.workspaceId, uploadId });
  const bytes = await readLogBytes(upload);
  return new Response(Buffer.from(bytes), { headers: downloadHeaders(upload.fileName, bytes.byteLength) });
});
