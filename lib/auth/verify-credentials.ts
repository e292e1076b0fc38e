import { z } from 'zod';
import { getSequelize } from '@/lib/db';
import { verifyPassword } from '@/lib/auth/password';
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

/** Checks an e-mail and password; returns the user or null. Never logs the password. */
export async function verifyCredentials(input: unknown): Promise<SignedInUser | null> {
  const parsed = credentialsSchema.safeParse(input);
  if (!parsed.success) return null;
  getSequelize();
  const user = await User.findOne({ where: { email: parsed.data.email } });
  const ok = user ? await verifyPassword(parsed.data.password, user.passwordHash) : false;
  if (!user || !ok) {
    await recordAudit({ action: 'auth.sign_in_failed', actorId: user?.id ?? null, data: { email: parsed.data.email } });
    return null;
  }
  await recordAudit({ action: 'auth.signed_in', actorId: user.id });
  return { id: user.id, email: user.email, name: user.name };
}
