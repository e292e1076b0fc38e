import { TextField } from './TextField';

type EmailFieldProps = {
  error?: string;
  /** `username` where it signs in to an existing account, `off` for someone else's address. */
  autoComplete?: 'email' | 'username' | 'off';
  'data-testid': string;
};

/** The e-mail box every account form starts with (field name `email`). */
export function EmailField({ error, autoComplete = 'email', 'data-testid': testId }: EmailFieldProps) {
  return (
    <TextField name="email" label="E-mail" type="email" autoComplete={autoComplete} inputMode="email" required error={error} data-testid={testId} />
  );
}
