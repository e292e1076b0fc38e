import 'server-only';
import { getServerSession } from 'next-auth';
import { redirect } from 'next/navigation';
import { authOptions } from '@/lib/auth/options';

/** For pages behind sign-in: the signed-in user, or a redirect to sign in and come back to `path`. */
export async function requireSession(path: string) {
  const session = await getServerSession(authOptions);
  if (!session?.user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(path)}`);
  return {
    displayName: session.user.name || session.user.email || 'Signed in',
    email: session.user.email ?? null,
  };
}

/** For public pages that read differently to a signed-in visitor. */
export async function signedInEmail(): Promise<string | null> {
  const session = await getServerSession(authOptions);
  return session?.user?.email ?? null;
}
