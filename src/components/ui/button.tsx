import type { ButtonHTMLAttributes, Ref } from 'react';

type Variant = 'primary' | 'secondary' | 'quiet' | 'danger';

const STYLES: Record<Variant, string> = {
  primary: 'bg-accent text-on-accent hover:bg-accent-hover border border-transparent',
  secondary: 'bg-panel text-ink border border-rule hover:border-accent',
  quiet: 'bg-transparent text-accent border border-transparent hover:underline',
  danger: 'bg-panel text-broken border border-broken/50 hover:bg-broken/10',
};

/** A button in one of four weights; `busy` disables it and says so to screen readers. */
export function Button({
  variant = 'primary',
  busy,
  className = '',
  children,
  ref,
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant; busy?: boolean; ref?: Ref<HTMLButtonElement> }) {
  return (
    <button
      {...props}
      ref={ref}
      disabled={props.disabled || busy}
      aria-busy={busy || undefined}
      className={`inline-flex items-center justify-center gap-2 rounded-md px-3.5 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed disabled:opacity-60 ${STYLES[variant]} ${className}`}
    >
      {children}
    </button>
  );
}
