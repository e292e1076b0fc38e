import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith, readJsonBody } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { decideReview } from '@/lib/reviews/decide-review';
import { decideReviewBodySchema, reviewIdSchema } from '@/lib/reviews/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'review:decide');
  const reviewId = parseWith(reviewIdSchema, (await params).id, 'id');
  const input = await readJsonBody(request, decideReviewBodySchema);
  return NextResponse.json(await decideReview({ actor, reviewId, input }));
});
