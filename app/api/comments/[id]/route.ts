import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { editComment } from '@/lib/comments/edit-comment';
import { commentIdSchema, editCommentBodySchema } from '@/lib/comments/schemas';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const PATCH = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'comment:create');
  const commentId = parseWith(commentIdSchema, (await params).id, 'id');
  const { body } = await readJsonBody(request, editCommentBodySchema);
  return NextResponse.json(await editComment({ actor, commentId, body }));
});
