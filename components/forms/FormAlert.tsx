import type { ReactNode } from 'react';

type FormAlertProps = {
  tone: 'error' | 'success';
  children: ReactNode;
  /** Overrides the shared test id where an older page already promised its own. */
  testId?: string;
  className?: string;
};

const tones = {
  error: { role: 'alert', testId: 'form-error', className: 'border-danger/40 bg-danger-soft' },
  success: { role: 'status', testId: 'form-success', className: 'border-accent/40 bg-accent-soft' },
} as const;

/** A message about the whole form (or page), as opposed to one field. */
export function FormAlert({ tone, children, testId, className }: FormAlertProps) {
  const style = tones[tone];
  return (
    <div
      role={style.role}
      data-testid={testId ?? style.testId}
      className={['rounded-md border px-3 py-2 text-sm text-ink', style.className, className]
        .filter(Boolean)
        .join(' ')}
    >
      {children}
    </div>
  );
}
