import { NextResponse, type NextRequest } from 'next/server';
import { sessionUserId } from '@/lib/auth/actor';
import { readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { acceptInvitation } from '@/lib/invitations/invitations';
import { acceptBodySchema } from '@/lib/invitations/schemas';
import { setWorkspaceCookie } from '@/lib/workspaces/workspace-cookie';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

// The token authorises; an existing account must also be signed in as the invited address (checked in the service).
export const POST = route(async (request: NextRequest) => {
  const body = await readJsonBody(request, acceptBodySchema, 16 * 1024);
  const result = await acceptInvitation({
    token: body.token,
    sessionUserId: await sessionUserId(request),
    newAccount: body.name !== undefined && body.password !== undefined ? { name: body.name, password: body.password } : undefined,
  });
  return setWorkspaceCookie(NextResponse.json({ workspace: result.workspace, email: result.email }), result.workspace.id);
});
