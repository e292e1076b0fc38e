import { randomUUID } from 'node:crypto';
import { encode } from 'next-auth/jwt';
import { NextRequest } from 'next/server';
import { hashPassword } from '@/lib/auth/password';
import { getSequelize } from '@/lib/db';
import { Membership, ROLES, User, Workspace, type Role } from '@/models';

export interface TestWorkspace {
  workspaceId: string;
  users: Record<Role, { id: string; email: string }>;
}

const PASSWORD_HASH = hashPassword('fixture-password-123');

/** A fresh workspace with one member per role, unique to the calling test. */
export async function createTestWorkspace(label = 'ws'): Promise<TestWorkspace> {
  getSequelize();
  const suffix = randomUUID().slice(0, 8);
  const workspace = await Workspace.create({ name: `Test ${label} ${suffix}`, slug: `test-${label}-${suffix}` });
  const users = {} as TestWorkspace['users'];
  for (const role of ROLES) {
    const email = `${role}-${suffix}@test.example`;
    const user = await User.create({ email, name: `${role} ${suffix}`, passwordHash: await PASSWORD_HASH });
    await Membership.create({ userId: user.id, workspaceId: workspace.id, role });
    users[role] = { id: user.id, email };
  }
  return { workspaceId: workspace.id, users };
}

/** A session cookie exactly as next-auth would set it for this user. */
export async function sessionCookie(userId: string): Promise<string> {
  const token = await encode({ token: { sub: userId }, secret: process.env.NEXTAUTH_SECRET ?? '' });
  return `next-auth.session-token=${token}`;
}

export async function apiRequest(
  path: string,
  { userId, method = 'GET', body, headers = {} }: { userId?: string; method?: string; body?: string | object; headers?: Record<string, string> } = {},
): Promise<NextRequest> {
  const allHeaders: Record<string, string> = { ...headers };
  if (userId) allHeaders.cookie = [await sessionCookie(userId), headers.cookie].filter(Boolean).join('; ');
  // A raw body (a field log) says its own type; an object is sent as JSON.
  if (body !== undefined && !allHeaders['content-type']) allHeaders['content-type'] = 'application/json';
  return new NextRequest(new URL(path, 'http://localhost:3000'), {
    method,
    headers: allHeaders,
    body: body === undefined ? undefined : typeof body === 'string' ? body : JSON.stringify(body),
  });
}
