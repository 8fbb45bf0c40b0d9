import Link from 'next/link';
import type { ComponentProps } from 'react';

type Variant = 'primary' | 'secondary' | 'danger';
const styles: Record<Variant, string> = {
  primary: 'bg-brand text-on-fill hover:bg-brand-dark disabled:bg-ink-faint',
  secondary: 'border-2 border-brand bg-paper text-brand hover:bg-brand-light',
  danger: 'bg-danger text-on-fill hover:opacity-90',
};
const base =
  'inline-flex min-h-tap items-center justify-center gap-2 rounded-lg px-5 text-gate font-bold disabled:cursor-not-allowed';

export function Button({
  variant = 'primary',
  className = '',
  ...props
}: ComponentProps<'button'> & { variant?: Variant }) {
  return <button {...props} className={`${base} ${styles[variant]} ${className}`} />;
}

export function ButtonLink({
  variant = 'primary',
  className = '',
  ...props
}: ComponentProps<typeof Link> & { variant?: Variant }) {
  return <Link {...props} className={`${base} ${styles[variant]} ${className}`} />;
}
