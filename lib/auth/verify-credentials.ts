import { z } from 'zod';
import { getSequelize } from '@/lib/db';
import { verifyPassword } from '@/lib/auth/password';
import { signInLimiter, type SignInLimiter } from '@/lib/auth/rate-limit';
import { recordAudit } from '@/lib/audit';
import { User } from '@/models';

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().email().max(254),
  password: z.string().min(1).max(200),
});

export interface SignedInUser {
  id: string;
  email: string;
  name: string;
}

/**
 * Checks an e-mail and password; returns the user or null. Refuses with
 * `rate_limited:sign_in` once the account or the address has used up its attempts,
 * even when the password is right. Never logs the password.
 */
export async function verifyCredentials(
  input: unknown,
  { address = 'unknown', limiter = signInLimiter() }: { address?: string; limiter?: SignInLimiter } = {},
): Promise<SignedInUser | null> {
  const parsed = credentialsSchema.safeParse(input);
  if (!parsed.success) return null;
  const { email, password } = parsed.data;
  getSequelize();
  await limiter.assertAllowed({ email, address });
  const user = await User.findOne({ where: { email } });
  const ok = user ? await verifyPassword(password, user.passwordHash) : false;
  if (!user || !ok) {
    await limiter.recordFailure({ email, address });
    await recordAudit({ action: 'auth.sign_in_failed', actorId: user?.id ?? null, data: { email, address } });
    return null;
  }
  await limiter.recordSuccess({ email });
  await recordAudit({ action: 'auth.signed_in', actorId: user.id, data: { address } });
  return { id: user.id, email: user.email, name: user.name };
}
