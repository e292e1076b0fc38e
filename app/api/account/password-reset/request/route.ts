import { NextResponse, type NextRequest } from 'next/server';
import { requestPasswordReset } from '@/lib/accounts/password-reset';
import { resetRequestBodySchema } from '@/lib/accounts/schemas';
import { readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest) => {
  const { email } = await readJsonBody(request, resetRequestBodySchema, 16 * 1024);
  await requestPasswordReset({ email });
  return NextResponse.json({ ok: true }, { status: 202 });
});
