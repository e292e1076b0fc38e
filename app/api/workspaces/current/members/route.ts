import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { route } from '@/lib/http/respond';
import { listMembers } from '@/lib/workspaces/members';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest) => {
  const actor = await authorizeRequest(request, 'member:read');
  return NextResponse.json({ members: await listMembers({ workspaceId: actor.workspaceId }) });
});
