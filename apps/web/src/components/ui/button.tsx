import type { ButtonHTMLAttributes, Ref } from 'react';
import { cn } from '@/lib/cn';

/** `refuse`: outlined red, for a refusal that sits beside a filled primary action (decline next to publish). */
export type ButtonVariant = 'primary' | 'secondary' | 'ghost' | 'danger' | 'refuse';

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: 'sm' | 'md';
  /** Disables the button and says so while a request is under way. */
  isPending?: boolean;
  pendingLabel?: string;
  ref?: Ref<HTMLButtonElement>;
}

const VARIANT_CLASSES: Record<ButtonVariant, string> = {
  primary: 'bg-signal-600 text-white hover:bg-signal-700 shadow-sm',
  secondary: 'bg-sand-50 text-ink-900 border border-sand-500 hover:bg-sand-200',
  ghost: 'bg-transparent text-ink-800 hover:bg-sand-200',
  danger: 'bg-flare-700 text-white hover:bg-flare-800',
  refuse: 'bg-white text-flare-800 border-2 border-dashed border-flare-700 hover:bg-flare-50',
};

const SIZE_CLASSES = {
  sm: 'min-h-9 px-3 text-sm',
  md: 'min-h-11 px-4 text-base',
} as const;

/** A button; `type` defaults to "button" so it never submits a form by accident. */
export function Button({
  variant = 'primary',
  size = 'md',
  isPending = false,
  pendingLabel,
  disabled,
  className,
  children,
  type = 'button',
  ref,
  ...rest
}: ButtonProps) {
  return (
    <button
      ref={ref}
      type={type}
      disabled={disabled || isPending}
      aria-busy={isPending || undefined}
      className={cn(
        'inline-flex items-center justify-center gap-2 rounded-md font-bold transition-colors',
        'disabled:cursor-not-allowed disabled:opacity-60',
        VARIANT_CLASSES[variant],
        SIZE_CLASSES[size],
        className,
      )}
      {...rest}
    >
      {isPending && (
        <span
          aria-hidden="true"
          className="size-4 animate-spin rounded-pill border-2 border-current border-r-transparent"
        />
      )}
      {isPending && pendingLabel ? pendingLabel : children}
    </button>
  );
}
