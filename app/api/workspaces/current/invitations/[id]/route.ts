import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { revokeInvitation } from '@/lib/invitations/invitations';
import { invitationIdSchema } from '@/lib/workspaces/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const DELETE = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'member:manage');
  const invitationId = parseWith(invitationIdSchema, (await params).id, 'id');
  await revokeInvitation({ actor, invitationId });
  return NextResponse.json({ ok: true });
});
