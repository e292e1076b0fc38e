import type { Metadata } from 'next';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { SignInForm } from '@/components/auth/SignInForm';
import { safeCallbackUrl } from '@/components/auth/safe-callback-url';
import { TextLink } from '@/components/ui/TextLink';

export const metadata: Metadata = { title: 'Sign in' };

type SignInPageProps = {
  searchParams: Promise<{ callbackUrl?: string | string[] }>;
};

export default async function SignInPage({ searchParams }: SignInPageProps) {
  const { callbackUrl } = await searchParams;

  return (
    <AuthFrame
      title="Sign in"
      intro="Sign in with your e-mail address to open your workspace."
      footer={
        <>
          <p>
            <TextLink href="/forgot-password" data-testid="forgot-password-link">
              Forgotten your password?
            </TextLink>
          </p>
          <p>
            New to Airproof?{' '}
            <TextLink href="/sign-up" data-testid="sign-up-link">
              Create an account
            </TextLink>
          </p>
          <p>
            Trying Airproof locally? The demo accounts are listed in the <code>README</code>.
          </p>
        </>
      }
    >
      <SignInForm callbackUrl={safeCallbackUrl(callbackUrl)} />
    </AuthFrame>
  );
}
