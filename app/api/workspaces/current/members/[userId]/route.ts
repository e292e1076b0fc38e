import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { changeMemberRole, removeMember } from '@/lib/workspaces/members';
import { changeRoleBodySchema, userIdSchema } from '@/lib/workspaces/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

type Context = { params: Promise<{ userId: string }> };

export const PATCH = route(async (request: NextRequest, { params }: Context) => {
  const actor = await authorizeRequest(request, 'member:manage');
  const userId = parseWith(userIdSchema, (await params).userId, 'userId');
  const { role } = await readJsonBody(request, changeRoleBodySchema, 4 * 1024);
  return NextResponse.json({ member: await changeMemberRole({ actor, userId, role }) });
});

export const DELETE = route(async (request: NextRequest, { params }: Context) => {
  const actor = await authorizeRequest(request, 'member:manage');
  const userId = parseWith(userIdSchema, (await params).userId, 'userId');
  await removeMember({ actor, userId });
  return NextResponse.json({ ok: true });
});
