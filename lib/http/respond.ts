import { NextResponse, type NextRequest } from 'next/server';
import { AppError, errorBody } from '@/lib/errors';

type Handler<C> = (request: NextRequest, context: C) => Promise<Response>;

/**
 * Wraps a route handler: application errors become their JSON error response;
 * anything else is logged and answered with a generic 500 (no database detail leaks).
 */
export function route<C = unknown>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export function errorResponse(error: unknown): Response {
  if (error instanceof AppError) {
    return NextResponse.json(errorBody(error), { status: error.status });
  }
  console.error('[airproof] unhandled error', error);
  return NextResponse.json(errorBody(new AppError('internal', 'server', 'Something went wrong on the server')), {
    status: 500,
  });
}
