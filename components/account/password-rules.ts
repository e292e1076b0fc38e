export const MIN_PASSWORD_LENGTH = 10;

/** Shown beside every new-password box; the server holds the same rules and has the last word. */
export const PASSWORD_RULES = [
  `At least ${MIN_PASSWORD_LENGTH} characters`,
  'Not one of the passwords people use most often',
  'Not your e-mail address',
] as const;

/** The rules the browser can check without a round trip; the common-password list stays on the server. */
export function newPasswordProblem(password: string, email: string): string | null {
  if (!password) return 'Choose a password.';
  if (password.length < MIN_PASSWORD_LENGTH) {
    return `Use at least ${MIN_PASSWORD_LENGTH} characters; this one has ${password.length}.`;
  }
  if (email && password.trim().toLowerCase() === email.trim().toLowerCase()) {
    return 'Choose a password that is not your e-mail address.';
  }
  return null;
}

export function confirmationProblem(password: string, confirmation: string): string | null {
  if (!confirmation) return 'Type the password again.';
  if (confirmation !== password) return 'The two passwords are not the same.';
  return null;
}
