import { NextResponse, type NextRequest } from 'next/server';
import { confirmPasswordReset } from '@/lib/accounts/password-reset';
import { resetConfirmBodySchema } from '@/lib/accounts/schemas';
import { readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

// The token is the authorisation: whoever holds the e-mailed link may set the password once.
export const POST = route(async (request: NextRequest) => {
  const input = await readJsonBody(request, resetConfirmBodySchema, 16 * 1024);
  await confirmPasswordReset(input);
  return NextResponse.json({ ok: true });
});
