// The server words its rate-limit refusal for people (including when to try again), so it is shown as sent.
const RATE_LIMITED_PREFIX = 'Too many sign-in attempts';

/** Turns next-auth's `signIn` result error into a sentence for the person signing in. */
export function signInFailureMessage(code: string | null | undefined): string {
  if (code === 'CredentialsSignin') return 'That e-mail address and password do not match an account.';
  if (code?.startsWith(RATE_LIMITED_PREFIX)) return code;
  return 'Signing in did not work just now. Try again in a moment.';
}
