import type { Metadata } from 'next';
import { ResetPasswordForm } from '@/components/account/ResetPasswordForm';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { FormAlert } from '@/components/forms/FormAlert';
import { TextLink } from '@/components/ui/TextLink';

export const metadata: Metadata = { title: 'Choose a new password' };

type ResetPasswordPageProps = {
  searchParams: Promise<{ token?: string | string[] }>;
};

export default async function ResetPasswordPage({ searchParams }: ResetPasswordPageProps) {
  const { token } = await searchParams;
  const value = Array.isArray(token) ? token[0] : token;

  return (
    <AuthFrame
      title="Choose a new password"
      footer={
        <p>
          <TextLink href="/sign-in">Back to sign in</TextLink>
        </p>
      }
    >
      {value ? (
        <ResetPasswordForm token={value} />
      ) : (
        <FormAlert tone="error">
          This link is missing its code. Open the link from the e-mail again, or{' '}
          <TextLink href="/forgot-password">ask for a new one</TextLink>.
        </FormAlert>
      )}
    </AuthFrame>
  );
}
