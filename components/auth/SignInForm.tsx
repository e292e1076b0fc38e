'use client';

import { useQueryClient } from '@tanstack/react-query';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useId, useRef, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/Button';

type FieldName = 'email' | 'password';
type FormError = { field?: FieldName; message: string };

// Deliberately loose: the server decides what a valid account is; this only catches typos.
const EMAIL_SHAPE = /^[^\s@]+@[^\s@]+$/;

function checkFields(email: string, password: string): FormError | null {
  if (!email) return { field: 'email', message: 'Enter your e-mail address.' };
  if (!EMAIL_SHAPE.test(email)) {
    return { field: 'email', message: 'Enter an e-mail address such as name@example.com.' };
  }
  if (!password) return { field: 'password', message: 'Enter your password.' };
  return null;
}

function messageForSignInError(code: string | null | undefined): string {
  if (code === 'CredentialsSignin') return 'That e-mail address and password do not match an account.';
  return 'Signing in did not work just now. Try again in a moment.';
}

const inputClassName =
  'mt-1 block h-10 w-full rounded-md border bg-paper-raised px-3 text-ink placeholder:text-ink-faint ' +
  'aria-invalid:border-danger aria-invalid:bg-danger-soft/40';

type SignInFormProps = {
  callbackUrl: string;
};

export function SignInForm({ callbackUrl }: SignInFormProps) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [error, setError] = useState<FormError | null>(null);
  const [pending, setPending] = useState(false);
  const emailRef = useRef<HTMLInputElement>(null);
  const passwordRef = useRef<HTMLInputElement>(null);
  const errorId = useId();

  async function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const email = String(form.get('email') ?? '').trim();
    const password = String(form.get('password') ?? '');

    const fieldError = checkFields(email, password);
    setError(fieldError);
    if (fieldError) {
      (fieldError.field === 'email' ? emailRef : passwordRef).current?.focus();
      return;
    }

    setPending(true);
    try {
      const result = await signIn('credentials', { email, password, redirect: false });
      if (!result?.ok || result.error) {
        setError({ message: messageForSignInError(result?.error) });
        setPending(false);
        return;
      }
      // Whatever was cached belonged to the previous session, possibly another user.
      queryClient.clear();
      router.push(callbackUrl);
    } catch {
      setError({ message: 'Could not reach the server. Check the connection and try again.' });
      setPending(false);
    }
  }

  const errorMessage = error ? (
    <p id={errorId} role="alert" data-testid="signin-error" className="mt-2 text-sm text-danger">
      {error.message}
    </p>
  ) : null;

  function describedBy(field: FieldName) {
    return error?.field === field ? errorId : undefined;
  }

  return (
    <form noValidate onSubmit={handleSubmit} className="space-y-5">
      <div>
        <label htmlFor="signin-email" className="block text-sm font-medium text-ink">
          E-mail
        </label>
        <input
          ref={emailRef}
          id="signin-email"
          name="email"
          type="email"
          autoComplete="username"
          inputMode="email"
          required
          aria-invalid={error?.field === 'email' || undefined}
          aria-describedby={describedBy('email')}
          className={inputClassName}
          data-testid="signin-email"
        />
        {error?.field === 'email' ? errorMessage : null}
      </div>

      <div>
        <label htmlFor="signin-password" className="block text-sm font-medium text-ink">
          Password
        </label>
        <input
          ref={passwordRef}
          id="signin-password"
          name="password"
          type="password"
          autoComplete="current-password"
          required
          aria-invalid={error?.field === 'password' || undefined}
          aria-describedby={describedBy('password')}
          className={inputClassName}
          data-testid="signin-password"
        />
        {error?.field === 'password' ? errorMessage : null}
      </div>

      {error && !error.field ? errorMessage : null}

      <Button
        type="submit"
        variant="primary"
        className="w-full"
        disabled={pending}
        data-testid="signin-submit"
      >
        {pending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
