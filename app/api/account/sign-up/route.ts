import { NextResponse, type NextRequest } from 'next/server';
import { createAccount } from '@/lib/accounts/create-account';
import { signUpBodySchema } from '@/lib/accounts/schemas';
import { readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

// Open to anyone: creating an account grants nothing until a workspace is created or an invitation accepted.
export const POST = route(async (request: NextRequest) => {
  const input = await readJsonBody(request, signUpBodySchema, 16 * 1024);
  const user = await createAccount(input);
  return NextResponse.json({ user }, { status: 201 });
});
