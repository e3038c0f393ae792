import type { ButtonHTMLAttributes } from 'react';
import { Link, type LinkProps } from 'react-router';
import { Spinner } from './spinner.tsx';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';
type Size = 'sm' | 'md';

const base =
  'inline-flex items-center justify-center gap-1.5 rounded font-medium whitespace-nowrap transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-55 focus-visible:outline-offset-2';

const variants: Record<Variant, string> = {
  primary: 'bg-accent text-paper-raised hover:bg-accent-strong shadow-[inset_0_-1px_0_rgb(0_0_0/0.18)]',
  secondary: 'border border-rule-strong bg-paper-raised text-ink hover:border-ink-faint hover:bg-white',
  quiet: 'text-accent hover:bg-accent-wash hover:text-accent-strong',
  danger: 'border border-danger/40 bg-paper-raised text-danger hover:bg-danger-wash',
};

const sizes: Record<Size, string> = {
  sm: 'h-7 px-2.5 text-sm',
  md: 'h-9 px-3.5 text-base',
};

/** Class names of a button, for elements that must look like one (links). */
export function buttonClass(variant: Variant = 'secondary', size: Size = 'md', extra = ''): string {
  return `${base} ${variants[variant]} ${sizes[size]} ${extra}`;
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: Size;
  /** Shows a spinner and blocks clicks while an action runs. */
  busy?: boolean;
}

export function Button({ variant = 'secondary', size = 'md', busy = false, className = '', children, disabled, type = 'button', ...rest }: ButtonProps) {
  return (
    <button type={type} className={buttonClass(variant, size, className)} disabled={disabled || busy} aria-busy={busy || undefined} {...rest}>
      {busy && <Spinner label="Working" className="text-current" />}
      {children}
    </button>
  );
}

/** A router link drawn as a button. */
export function ButtonLink({ variant = 'secondary', size = 'md', className = '', ...rest }: LinkProps & { variant?: Variant; size?: Size }) {
  return <Link className={buttonClass(variant, size, className)} {...rest} />;
}
