import { ApiError } from '@/components/api/api-error';

/** Explains a refused role change or removal; the last-owner rule gets a way out, not just a no. */
export function memberChangeProblem(error: unknown, action: string): string {
  if (error instanceof ApiError && error.code === 'conflict:last_owner') {
    return `Could not ${action}: a workspace always needs an owner. Make another member an owner first.`;
  }
  const reason = error instanceof Error ? error.message : 'Try again in a moment.';
  return `Could not ${action}. ${reason}`;
}
