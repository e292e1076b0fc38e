import { NextResponse, type NextRequest } from 'next/server';
import { parseSearchParams } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { lookupInvitation } from '@/lib/invitations/invitations';
import { lookupQuerySchema } from '@/lib/invitations/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

// The e-mailed token is the authorisation to see what the invitation offers.
export const GET = route(async (request: NextRequest) => {
  const { token } = parseSearchParams(request, lookupQuerySchema);
  return NextResponse.json(await lookupInvitation({ token }));
});
