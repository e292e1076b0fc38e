// Deliberately loose: the server decides what a valid address is; this only catches typos.
const EMAIL_SHAPE = /^[^\s@]+@[^\s@]+$/;

export function emailProblem(email: string): string | null {
  if (!email) return 'Enter an e-mail address.';
  if (!EMAIL_SHAPE.test(email)) return 'Enter an e-mail address such as name@example.com.';
  return null;
}
