import type { ButtonHTMLAttributes } from 'react';

const VARIANT_CLASSES = {
  primary: 'bg-ink text-paper hover:bg-ink-soft border-ink',
  secondary: 'bg-surface text-ink hover:bg-paper border-line-strong',
  danger: 'bg-danger text-white hover:bg-[#8a2a24] border-danger',
  quiet: 'bg-transparent text-ink hover:bg-ink/5 border-transparent',
} as const;

const SIZE_CLASSES = {
  regular: 'px-4 py-2 text-base',
  small: 'px-3 py-1 text-sm',
} as const;

type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: keyof typeof VARIANT_CLASSES;
  size?: keyof typeof SIZE_CLASSES;
  /** Shows the busy label and disables the button while a request runs. */
  pending?: boolean;
  pendingLabel?: string;
};

export function Button({
  variant = 'primary',
  size = 'regular',
  pending = false,
  pendingLabel,
  disabled,
  className = '',
  type = 'button',
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={`inline-flex items-center justify-center gap-2 rounded-md border font-semibold transition-colors disabled:cursor-not-allowed disabled:opacity-60 ${VARIANT_CLASSES[variant]} ${SIZE_CLASSES[size]} ${className}`}
      {...rest}
    >
      {pending && pendingLabel ? pendingLabel : children}
    </button>
  );
}
