'use client';

import { EmailField } from '@/components/forms/EmailField';
import { useQueryClient } from '@tanstack/react-query';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { emailProblem } from '@/components/forms/email-problem';
import { FormAlert } from '@/components/forms/FormAlert';
import { TextField } from '@/components/forms/TextField';
import { useFormErrors, type FieldErrors } from '@/components/forms/use-form-errors';
import { Button } from '@/components/ui/Button';
import { signInFailureMessage } from './sign-in-failure-message';

const FIELDS = ['email', 'password'] as const;
type Field = (typeof FIELDS)[number];

function checkFields(email: string, password: string): FieldErrors<Field> {
  return {
    email: emailProblem(email) ?? undefined,
    password: password ? undefined : 'Enter your password.',
  };
}

type SignInFormProps = {
  callbackUrl: string;
};

export function SignInForm({ callbackUrl }: SignInFormProps) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { formRef, errors, showFieldErrors } = useFormErrors(FIELDS);
  const [failure, setFailure] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const email = String(form.get('email') ?? '').trim();
    const password = String(form.get('password') ?? '');

    setFailure(null);
    if (showFieldErrors(checkFields(email, password))) return;

    setPending(true);
    try {
      const result = await signIn('credentials', { email, password, redirect: false });
      if (!result?.ok || result.error) {
        setFailure(signInFailureMessage(result?.error));
        setPending(false);
        return;
      }
      // Whatever was cached belonged to the previous session, possibly another user.
      queryClient.clear();
      router.push(callbackUrl);
    } catch {
      setFailure('Could not reach the server. Check the connection and try again.');
      setPending(false);
    }
  }

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="space-y-5">
      <EmailField autoComplete="username" error={errors.fields.email} data-testid="signin-email" />
      <TextField
        name="password"
        label="Password"
        type="password"
        autoComplete="current-password"
        required
        error={errors.fields.password}
        data-testid="signin-password"
      />

      {failure ? (
        <FormAlert tone="error" testId="signin-error">
          {failure}
        </FormAlert>
      ) : null}

      <Button type="submit" variant="primary" className="w-full" disabled={pending} data-testid="signin-submit">
        {pending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
