import type { Metadata } from 'next';
import { ForgotPasswordForm } from '@/components/account/ForgotPasswordForm';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { TextLink } from '@/components/ui/TextLink';

export const metadata: Metadata = { title: 'Forgotten password' };

export default function ForgotPasswordPage() {
  return (
    <AuthFrame
      title="Forgotten your password?"
      intro="Enter the e-mail address you sign in with and we will send you a link to choose a new password."
      footer={
        <p>
          Remembered it? <TextLink href="/sign-in">Back to sign in</TextLink>
        </p>
      }
    >
      <ForgotPasswordForm />
    </AuthFrame>
  );
}
