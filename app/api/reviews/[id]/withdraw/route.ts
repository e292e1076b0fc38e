import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseWith } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { withdrawReview } from '@/lib/reviews/withdraw-review';
import { reviewIdSchema } from '@/lib/reviews/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = route(async (request: NextRequest, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await authorizeRequest(request, 'review:request');
  const reviewId = parseWith(reviewIdSchema, (await params).id, 'id');
  return NextResponse.json(await withdrawReview({ actor, reviewId }));
});
