import { NextResponse, type NextRequest } from 'next/server';
import { authorizeRequest } from '@/lib/auth/actor';
import { parseSearchParams } from '@/lib/http/parse';
import { route } from '@/lib/http/respond';
import { listReviews } from '@/lib/reviews/list-reviews';
import { listReviewsQuerySchema } from '@/lib/reviews/schemas';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = route(async (request: NextRequest) => {
  const actor = await authorizeRequest(request, 'circuit:read');
  const query = parseSearchParams(request, listReviewsQuerySchema);
  return NextResponse.json(await listReviews({ actor, query }));
});
