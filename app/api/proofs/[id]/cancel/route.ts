import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { cancelProof } from '@/lib/proofs/proofs';
import { proofIdSchema } from '@/lib/proofs/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'proof:run');
  const proofId = parseWith(proofIdSchema, (await params).id, 'id');
  return NextResponse.json(await cancelProof({ actor, proofId }));
});
