import { TextField } from '@/components/forms/TextField';
import { PasswordRules } from './PasswordRules';

type NewPasswordFieldProps = {
  name: 'password' | 'passwordConfirm';
  label: string;
  error?: string;
  'data-testid': string;
};

/** A box for choosing a password; the first one of a form lists the rules under it. */
export function NewPasswordField({ name, label, error, 'data-testid': testId }: NewPasswordFieldProps) {
  return (
    <TextField
      name={name}
      label={label}
      type="password"
      autoComplete="new-password"
      required
      hint={name === 'password' ? <PasswordRules /> : undefined}
      error={error}
      data-testid={testId}
    />
  );
}
