'use client';

import type { ButtonHTMLAttributes } from 'react';
import { useInteractive } from './use-interactive';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

const styles: Record<Variant, string> = {
  primary: 'bg-tide-500 text-white hover:bg-tide-600 active:bg-tide-700 disabled:bg-tide-300',
  secondary: 'bg-paper-raised text-ink border border-line-strong hover:bg-paper-sunk disabled:text-ink-muted',
  danger: 'bg-brick-500 text-white hover:bg-brick-700 disabled:opacity-60',
  quiet: 'text-tide-600 hover:bg-tide-50 disabled:text-ink-muted',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  busy?: boolean;
}

/** A button that says when it is working (`busy`) and cannot be pressed twice meanwhile. */
export function Button({ variant = 'primary', busy = false, className = '', children, disabled, type = 'button', ...rest }: ButtonProps) {
  const interactive = useInteractive();
  return (
    <button
      type={type}
      className={`inline-flex items-center justify-center gap-2 rounded-md px-4 py-2 text-body font-medium transition-colors disabled:cursor-not-allowed ${styles[variant]} ${className}`}
      disabled={disabled || busy || !interactive}
      aria-busy={busy || undefined}
      {...rest}
    >
      {busy ? <span aria-hidden className="size-3 animate-spin rounded-full border-2 border-current border-t-transparent" /> : null}
      {children}
    </button>
  );
}
