import { forwardRef, type ButtonHTMLAttributes } from 'react';
import { cx } from './cx';

export type Variant = 'primary' | 'secondary' | 'quiet' | 'danger' | 'onDark';
export type Size = 'md' | 'lg' | 'xl';

const variants: Record<Variant, string> = {
  primary: 'bg-cellar-800 text-white hover:bg-cellar-700 active:bg-cellar-900 disabled:bg-ink-300',
  secondary:
    'bg-white text-cellar-800 border-2 border-cellar-800 hover:bg-cellar-100 disabled:text-ink-300 disabled:border-ink-300',
  quiet: 'bg-transparent text-cellar-700 hover:bg-mist-100 disabled:text-ink-300',
  danger: 'bg-ember-600 text-white hover:bg-ember-700 disabled:bg-ink-300',
  onDark: 'bg-transparent text-white border-2 border-white/80 hover:bg-cellar-700',
};

const sizes: Record<Size, string> = {
  md: 'min-h-touch px-4 text-base',
  lg: 'min-h-[56px] px-6 text-lg',
  xl: 'min-h-[72px] px-8 text-xl',
};

/** The look of a button, for anything that should look like one (a link that is a step in the work). */
export function buttonClass({
  variant = 'primary',
  size = 'md',
  className,
}: { variant?: Variant; size?: Size; className?: string } = {}): string {
  return cx(
    'inline-flex min-w-touch items-center justify-center gap-2 rounded-lg font-semibold transition-colors disabled:cursor-not-allowed',
    variants[variant],
    sizes[size],
    className,
  );
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: Size;
  busy?: boolean;
}

export const Button = forwardRef<HTMLButtonElement, ButtonProps>(function Button(
  { variant = 'primary', size = 'md', busy, className, children, disabled, type = 'button', ...rest },
  ref,
) {
  return (
    <button
      ref={ref}
      type={type}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={buttonClass({ variant, size, className })}
      {...rest}
    >
      {busy && (
        <span className="h-4 w-4 animate-spin rounded-full border-2 border-current border-t-transparent" aria-hidden />
      )}
      {children}
    </button>
  );
});
