import type { ButtonHTMLAttributes } from 'react';
import { Link, type LinkProps } from 'react-router-dom';
import { cx } from './cx';

type Variant = 'primary' | 'secondary' | 'ghost' | 'danger';
type Size = 'sm' | 'md';

const base =
  'inline-flex items-center justify-center gap-2 rounded-md font-medium transition-colors no-underline hover:no-underline disabled:cursor-not-allowed disabled:opacity-60 focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-ember-300';
const variants: Record<Variant, string> = {
  primary: 'bg-ember-400 text-ember-900 hover:bg-ember-300',
  secondary: 'border border-dusk-500 bg-dusk-800 text-dusk-100 hover:bg-dusk-700',
  ghost: 'text-dusk-100 hover:bg-dusk-800',
  danger: 'border border-rosehip-400 bg-transparent text-rosehip-300 hover:bg-rosehip-900',
};
const sizes: Record<Size, string> = { sm: 'min-h-9 px-3 text-sm', md: 'min-h-11 px-4 text-base' };

/** Class names of a button, for links that look like one. */
export const buttonClasses = (variant: Variant = 'primary', size: Size = 'md', extra?: string) =>
  cx(base, variants[variant], sizes[size], extra);

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: Size;
  busy?: boolean;
}

/** A button; primary (amber) for the one main action of a screen. */
export function Button({
  variant = 'primary',
  size = 'md',
  busy,
  className,
  children,
  disabled,
  type = 'button',
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      {...rest}
    >
      {children}
    </button>
  );
}

/** A router link drawn as a button. */
export function ButtonLink({
  variant = 'primary',
  size = 'md',
  className,
  ...rest
}: LinkProps & { variant?: Variant; size?: Size }) {
  return <Link className={buttonClasses(variant, size, className)} {...rest} />;
}
