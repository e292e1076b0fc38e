import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { reopenComment } from '@/lib/comments/resolve-comment';
import { commentIdSchema } from '@/lib/comments/schemas';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'comment:create');
  const commentId = parseWith(commentIdSchema, (await params).id, 'id');
  return NextResponse.json(await reopenComment({ actor, commentId }));
});
