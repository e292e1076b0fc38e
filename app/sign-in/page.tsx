import type { Metadata } from 'next';
import Link from 'next/link';
import { SignInForm } from '@/components/auth/SignInForm';
import { safeCallbackUrl } from '@/components/auth/safe-callback-url';
import { LogoMark } from '@/components/shell/LogoMark';

export const metadata: Metadata = { title: 'Sign in' };

type SignInPageProps = {
  searchParams: Promise<{ callbackUrl?: string | string[] }>;
};

export default async function SignInPage({ searchParams }: SignInPageProps) {
  const { callbackUrl } = await searchParams;

  return (
    <main id="main" className="flex min-h-dvh items-start justify-center px-4 py-12 sm:items-center">
      <div className="w-full max-w-sm">
        <Link href="/" className="inline-flex items-center gap-2 rounded-md py-1 text-ink">
          <LogoMark className="size-7 text-accent" />
          <span className="text-lg font-semibold tracking-tight">Airproof</span>
        </Link>

        <div className="mt-6 rounded-lg border border-rule bg-paper-raised p-6 shadow-sm">
          <h1 className="text-xl">Sign in</h1>
          <p className="mt-1 text-sm text-ink-soft">
            Use the account your workspace owner set up for you.
          </p>
          <div className="mt-6">
            <SignInForm callbackUrl={safeCallbackUrl(callbackUrl)} />
          </div>
        </div>

        <p className="mt-4 text-sm text-ink-soft">
          Trying Airproof locally? The demo accounts are listed in the <code>README</code>.
        </p>
      </div>
    </main>
  );
}
