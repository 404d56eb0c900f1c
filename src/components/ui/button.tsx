import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';

const VARIANTS: Record<Variant, string> = {
  primary: 'bg-copper-600 text-white hover:bg-copper-700 disabled:bg-copper-100 disabled:text-copper-700',
  secondary: 'bg-panel text-ink border border-line hover:border-copper-500 disabled:opacity-50',
  ghost: 'text-ink-soft hover:text-ink hover:bg-copper-50',
  danger: 'bg-state-returned text-white hover:brightness-110 disabled:opacity-50',
};

export function Button({ variant = 'primary', className = '', ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      type="button"
      {...props}
      className={`inline-flex items-center gap-1.5 whitespace-nowrap rounded px-3 py-1.5 text-sm font-semibold transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${className}`}
    />
  );
}
