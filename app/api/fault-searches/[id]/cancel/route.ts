import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { cancelFaultSearch } from '@/lib/replays/fault-searches';
import { faultSearchIdSchema } from '@/lib/replays/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'replay:run');
  const faultSearchId = parseWith(faultSearchIdSchema, (await params).id, 'id');
  return NextResponse.json(await cancelFaultSearch({ actor, faultSearchId }));
});
