import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { circuitIdSchema } from '@/lib/circuits/schemas';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { listCircuitReviews } from '@/lib/reviews/list-reviews';
import { requestReview } from '@/lib/reviews/request-review';
import { requestReviewBodySchema } from '@/lib/reviews/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  return NextResponse.json(await listCircuitReviews({ workspaceId: actor.workspaceId, circuitId }));
});

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'review:request');
  const circuitId = parseWith(circuitIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, requestReviewBodySchema);
  return NextResponse.json(await requestReview({ actor, circuitId, input }), { status: 201 });
});
