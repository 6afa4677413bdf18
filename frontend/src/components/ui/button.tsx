import type { ComponentProps } from 'react';

import { buttonClasses, type ButtonSize, type ButtonVariant } from './button-styles';

type ButtonProps = ComponentProps<'button'> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shown instead of the children while a request runs, so the person sees it was taken. */
  pendingLabel?: string;
  isPending?: boolean;
};

export function Button({ variant, size, pendingLabel, isPending = false, className = '', type = 'button', disabled, children, ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      className={buttonClasses(variant, size, className)}
      disabled={disabled || isPending}
      aria-busy={isPending || undefined}
      {...rest}
    >
      {isPending && pendingLabel ? pendingLabel : children}
    </button>
  );
}
