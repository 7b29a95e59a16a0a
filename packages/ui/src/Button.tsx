import type { ComponentPropsWithRef } from 'react';
import { cx } from './cx.ts';

type ButtonVariant = 'primary' | 'secondary' | 'danger';
/** `md` is 48px tall; `hand` is the one-hand size: 64px tall and full width. */
type ButtonSize = 'md' | 'hand';

export type ButtonProps = ComponentPropsWithRef<'button'> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
};

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-vat-800 text-wool-50 hover:bg-vat-700 border-vat-800',
  secondary: 'bg-wool-50 text-vat-900 hover:bg-vat-100 border-vat-800',
  danger: 'bg-madder-700 text-wool-50 hover:bg-madder-800 border-madder-700',
};

const sizes: Record<ButtonSize, string> = {
  md: 'min-h-12 min-w-12 px-5 text-base',
  hand: 'min-h-16 w-full px-6 text-xl',
};

/** The button look, also for links that act as a next step (`<Link className={buttonClass()}>`). */
export function buttonClass(variant: ButtonVariant = 'primary', size: ButtonSize = 'md') {
  return cx(
    'inline-flex items-center justify-center gap-2 rounded-xl border-2 font-bold',
    'transition-colors disabled:cursor-not-allowed disabled:opacity-60',
    variants[variant],
    sizes[size],
  );
}

export function Button({
  variant = 'primary',
  size = 'md',
  type = 'button',
  className,
  ...rest
}: ButtonProps) {
  return <button type={type} className={cx(buttonClass(variant, size), className)} {...rest} />;
}
