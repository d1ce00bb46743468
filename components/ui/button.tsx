import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'danger';

const STYLES: Record<Variant, string> = {
  primary: 'bg-accent text-white hover:bg-accent-strong disabled:opacity-60',
  secondary: 'border border-panel-line bg-white text-ink hover:bg-panel-deep disabled:opacity-60',
  danger: 'border border-band-off/40 bg-white text-band-off hover:bg-band-off/10 disabled:opacity-60',
};

/** A button's look, for a link that acts as one. */
export const buttonClass = (variant: Variant = 'primary', className = '') =>
  `inline-flex min-h-tap items-center justify-center gap-2 rounded-md px-4 font-medium ${STYLES[variant]} ${className}`;

export function Button({ variant = 'primary', className = '', ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return <button {...props} className={buttonClass(variant, className)} />;
}
