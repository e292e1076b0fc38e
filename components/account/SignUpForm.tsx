'use client';

import { PersonNameField } from '@/components/forms/PersonNameField';
import { EmailField } from '@/components/forms/EmailField';
import { NewPasswordField } from '@/components/account/NewPasswordField';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import type { FormEvent } from 'react';
import { sendJson } from '@/components/api/request-json';
import { signInFailureMessage } from '@/components/auth/sign-in-failure-message';
import { emailProblem } from '@/components/forms/email-problem';
import { FormAlert } from '@/components/forms/FormAlert';
import { useFormErrors, type FieldErrors } from '@/components/forms/use-form-errors';
import { Button } from '@/components/ui/Button';
import { TextLink } from '@/components/ui/TextLink';
import { confirmationProblem, newPasswordProblem } from './password-rules';

const FIELDS = ['name', 'email', 'password', 'passwordConfirm'] as const;
type Field = (typeof FIELDS)[number];
type SignUp = { name: string; email: string; password: string };

function checkFields(entry: SignUp, passwordConfirm: string): FieldErrors<Field> {
  return {
    name: entry.name ? undefined : 'Enter your name.',
    email: emailProblem(entry.email) ?? undefined,
    password: newPasswordProblem(entry.password, entry.email) ?? undefined,
    passwordConfirm: confirmationProblem(entry.password, passwordConfirm) ?? undefined,
  };
}

export function SignUpForm() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const { formRef, errors, showFieldErrors, showApiError } = useFormErrors(FIELDS);

  const signUp = useMutation({
    mutationFn: async (entry: SignUp) => {
      await sendJson('POST', '/api/account/sign-up', entry);
      return signIn('credentials', { email: entry.email, password: entry.password, redirect: false });
    },
    onSuccess: (result) => {
      if (!result?.ok || result.error) return;
      queryClient.clear();
      router.push('/workspaces/new');
    },
    onError: showApiError,
  });

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const entry: SignUp = {
      name: String(form.get('name') ?? '').trim(),
      email: String(form.get('email') ?? '').trim(),
      password: String(form.get('password') ?? ''),
    };
    if (showFieldErrors(checkFields(entry, String(form.get('passwordConfirm') ?? '')))) return;
    signUp.mutate(entry);
  }

  // The account exists even when the automatic sign-in is refused, so the way on is the sign-in page.
  const signInResult = signUp.data;
  const signInRefused = signInResult && (!signInResult.ok || signInResult.error);

  if (signInRefused) {
    return (
      <FormAlert tone="error">
        Your account was created, but signing you in did not work:{' '}
        {signInFailureMessage(signInResult.error)}{' '}
        <TextLink href="/sign-in?callbackUrl=%2Fworkspaces%2Fnew">Sign in</TextLink>{' '}
        to continue.
      </FormAlert>
    );
  }

  const busy = signUp.isPending || signUp.isSuccess;

  return (
    <form ref={formRef} noValidate onSubmit={handleSubmit} className="space-y-5">
      <PersonNameField error={errors.fields.name} data-testid="signup-name" />
      <EmailField error={errors.fields.email} data-testid="signup-email" />
      <NewPasswordField name="password" label="Password" error={errors.fields.password} data-testid="signup-password" />
      <NewPasswordField name="passwordConfirm" label="Password again" error={errors.fields.passwordConfirm} data-testid="signup-password-confirm" />

      {errors.form ? <FormAlert tone="error">{errors.form}</FormAlert> : null}

      <Button type="submit" variant="primary" className="w-full" disabled={busy} data-testid="signup-submit">
        {busy ? 'Creating your account…' : 'Create account'}
      </Button>
    </form>
  );
}
