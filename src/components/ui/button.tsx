import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'danger' | 'ghost';

const STYLES: Record<Variant, string> = {
  primary: 'bg-accent text-white hover:bg-accent-strong disabled:bg-muted',
  secondary: 'border border-line bg-white text-ink hover:bg-paper-deep disabled:text-muted',
  danger: 'border border-act bg-white text-act hover:bg-act-soft disabled:border-line disabled:text-muted',
  ghost: 'text-accent hover:bg-accent-soft disabled:text-muted disabled:hover:bg-transparent',
};

export function Button({
  variant = 'primary',
  className = '',
  type = 'button',
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      type={type}
      className={`inline-flex items-center justify-center gap-2 rounded-md px-4 py-2 text-sm font-semibold transition-colors disabled:cursor-not-allowed ${STYLES[variant]} ${className}`}
      {...props}
    />
  );
}
