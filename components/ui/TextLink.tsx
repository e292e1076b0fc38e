import Link from 'next/link';
import type { ComponentProps } from 'react';

/** An inline link in running text, underlined so it does not rely on colour alone. */
export function TextLink({ className, ...rest }: ComponentProps<typeof Link>) {
  return (
    <Link
      className={['font-medium text-accent-strong underline underline-offset-2 hover:text-ink', className]
        .filter(Boolean)
        .join(' ')}
      {...rest}
    />
  );
}
