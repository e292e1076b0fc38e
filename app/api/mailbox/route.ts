import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { route } from '@/lib/http/respond';
import { listCaughtMail } from '@/lib/mailbox';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest) => {
  await authorizeRequest(request, 'mailbox:read');
  return NextResponse.json({ messages: await listCaughtMail() });
});
