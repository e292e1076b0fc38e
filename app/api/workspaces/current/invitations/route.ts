import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { createInvitation, listInvitations } from '@/lib/invitations/invitations';
import { createInvitationBodySchema } from '@/lib/workspaces/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest) => {
  const actor = await authorizeRequest(request, 'member:manage');
  return NextResponse.json({ invitations: await listInvitations({ workspaceId: actor.workspaceId }) });
});

export const POST = route(async (request: NextRequest) => {
  const actor = await authorizeRequest(request, 'member:manage');
  const { email, role } = await readJsonBody(request, createInvitationBodySchema, 4 * 1024);
  return NextResponse.json({ invitation: await createInvitation({ actor, email, role }) }, { status: 201 });
});
