import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { verifyCredentials } from '@/lib/auth/verify-credentials';
import { AppError } from '@/lib/errors';

/** The client address as the proxy in front of us reports it; first hop only. */
function clientAddress(headers: Record<string, unknown> | undefined): string {
  const forwarded = headers?.['x-forwarded-for'];
  const first = typeof forwarded === 'string' ? forwarded.split(',')[0]?.trim() : undefined;
  return first || 'unknown';
}

export const authOptions: NextAuthOptions = {
  session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
  pages: { signIn: '/sign-in', signOut: '/sign-out' },
  providers: [
    CredentialsProvider({
      id: 'credentials',
      name: 'E-mail and password',
      credentials: {
        email: { label: 'E-mail', type: 'email' },
        password: { label: 'Password', type: 'password' },
      },
      authorize: async (credentials, req) => {
        try {
          return await verifyCredentials(credentials, { address: clientAddress(req?.headers) });
        } catch (error) {
          // next-auth hands a thrown message to the sign-in form as its error text.
          if (error instanceof AppError && error.type === 'rate_limited') throw new Error(error.message);
          throw error;
        }
      },
    }),
  ],
  callbacks: {
    // The role is not put in the token: it is looked up per request, so a role change takes effect at once.
    session: ({ session, token }) => {
      if (session.user && token.sub) session.user.id = token.sub;
      return session;
    },
  },
};
