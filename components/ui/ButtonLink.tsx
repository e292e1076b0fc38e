import Link from 'next/link';
import type { ComponentProps } from 'react';
import { buttonClassName, type ButtonSize, type ButtonVariant } from './button-styles';

type ButtonLinkProps = ComponentProps<typeof Link> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
};

export function ButtonLink({ variant, size, className, ...rest }: ButtonLinkProps) {
  return <Link className={buttonClassName(variant, size, className)} {...rest} />;
}
