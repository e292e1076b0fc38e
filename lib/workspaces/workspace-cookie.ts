import type { NextResponse } from 'next/server';
import { WORKSPACE_COOKIE } from '@/lib/auth/actor';

/** Remembers the active workspace in the browser; the server re-checks membership on every request. */
export function setWorkspaceCookie(response: NextResponse, workspaceId: string): NextResponse {
  response.cookies.set(WORKSPACE_COOKIE, workspaceId, {
    httpOnly: true,
    sameSite: 'lax',
    path: '/',
    secure: process.env.NEXTAUTH_URL?.startsWith('https://') ?? false,
    maxAge: 365 * 24 * 60 * 60,
  });
  return response;
}
