import { NextResponse, type NextRequest } from 'next/server';
import { requireUserId, WORKSPACE_COOKIE } from '@/lib/auth/actor';
import { readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { setWorkspaceCookie } from '@/lib/workspaces/workspace-cookie';
import { createWorkspaceBodySchema } from '@/lib/workspaces/schemas';
import { createWorkspace, listMyWorkspaces } from '@/lib/workspaces/workspaces';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

// Any signed-in user may list their own workspaces and found a new one (becoming its owner).
export const GET = route(async (request: NextRequest) => {
  const userId = await requireUserId(request);
  const workspaces = await listMyWorkspaces({ userId, activeWorkspaceId: request.cookies.get(WORKSPACE_COOKIE)?.value });
  if (workspaces.length && !workspaces.some((w) => w.active)) workspaces[0]!.active = true;
  return NextResponse.json({ workspaces });
});

export const POST = route(async (request: NextRequest) => {
  const userId = await requireUserId(request);
  const { name } = await readJsonBody(request, createWorkspaceBodySchema, 16 * 1024);
  const workspace = await createWorkspace({ userId, name });
  return setWorkspaceCookie(NextResponse.json({ workspace }, { status: 201 }), workspace.id);
});
