import { NextResponse, type NextRequest } from 'next/server';
import { requireUserId } from '@/lib/auth/actor';
import { readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { setWorkspaceCookie } from '@/lib/workspaces/workspace-cookie';
import { switchWorkspaceBodySchema } from '@/lib/workspaces/schemas';
import { findMembership } from '@/lib/workspaces/workspaces';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest) => {
  const userId = await requireUserId(request);
  const { workspaceId } = await readJsonBody(request, switchWorkspaceBodySchema, 4 * 1024);
  const membership = await findMembership({ userId, workspaceId });
  return setWorkspaceCookie(NextResponse.json(membership), workspaceId);
});
