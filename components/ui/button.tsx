import Link from 'next/link';
import type { ComponentProps } from 'react';

const VARIANTS = {
  primary: 'bg-copper text-white hover:bg-copper-dark border border-copper',
  secondary: 'bg-paper-raised text-ink border border-line-strong hover:bg-paper-sunken',
  quiet: 'bg-transparent text-ink-soft hover:text-ink hover:bg-paper-sunken border border-transparent',
} as const;

const BASE =
  'inline-flex min-h-touch items-center justify-center gap-2 rounded-lg px-5 py-2 font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-60';

type Variant = keyof typeof VARIANTS;

export function Button({ variant = 'primary', className = '', ...props }: ComponentProps<'button'> & { variant?: Variant }) {
  return <button className={`${BASE} ${VARIANTS[variant]} ${className}`} {...props} />;
}

export function ButtonLink({ variant = 'primary', className = '', ...props }: ComponentProps<typeof Link> & { variant?: Variant }) {
  return <Link className={`${BASE} ${VARIANTS[variant]} ${className}`} {...props} />;
}
