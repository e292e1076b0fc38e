import { TextField } from './TextField';

/** The new account holder's name (field name `name`). */
export function PersonNameField({ error, 'data-testid': testId }: { error?: string; 'data-testid': string }) {
  return <TextField name="name" label="Your name" autoComplete="name" required error={error} data-testid={testId} />;
}
