export type ButtonVariant = 'primary' | 'secondary' | 'quiet' | 'danger';
export type ButtonSize = 'sm' | 'md';

const base =
  'inline-flex items-center justify-center gap-2 rounded-md border font-medium transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-60';

const variants: Record<ButtonVariant, string> = {
  primary: 'border-accent bg-accent text-white hover:border-accent-strong hover:bg-accent-strong',
  secondary: 'border-rule bg-paper-raised text-ink hover:border-ink-faint hover:bg-paper-sunk',
  quiet: 'border-transparent bg-transparent text-ink-soft hover:bg-paper-sunk hover:text-ink',
  danger: 'border-danger bg-danger text-white hover:bg-danger/85',
};

const sizes: Record<ButtonSize, string> = {
  sm: 'h-8 px-3 text-sm',
  md: 'h-10 px-4 text-sm',
};

/** Shared by Button and ButtonLink so a link that acts as a button looks exactly like one. */
export function buttonClassName(
  variant: ButtonVariant = 'secondary',
  size: ButtonSize = 'md',
  extra?: string,
): string {
  return [base, variants[variant], sizes[size], extra].filter(Boolean).join(' ');
}
