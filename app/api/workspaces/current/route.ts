import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { permissionsOf } from '@/lib/auth/policy';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest) => {
  const actor = await authorizeRequest(request, 'workspace:read');
  return NextResponse.json({ workspace: { id: actor.workspaceId, name: actor.workspaceName }, role: actor.role, permissions: permissionsOf(actor.role) });
});
