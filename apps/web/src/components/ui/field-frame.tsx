import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export interface FieldFrameProps {
  /** The control's id. */
  id: string;
  label: string;
  hint?: string | undefined;
  error?: string | undefined;
  /** Says "(required)" to screen readers after the label. */
  isRequired?: boolean | undefined;
  className?: string | undefined;
  /** The control, with `id` and `aria-describedby={describedByOf(id, hint, error)}`. */
  children: ReactNode;
}

/** The label, hint and error around one form control. */
export function FieldFrame({
  id,
  label,
  hint,
  error,
  isRequired,
  className,
  children,
}: FieldFrameProps) {
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-bold text-ink-900">
        {label}
        {isRequired && <span className="sr-only"> (required)</span>}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="text-xs text-ink-600">
          {hint}
        </p>
      )}
      {children}
      {error && (
        <p id={`${id}-error`} className="text-sm font-bold text-flare-700">
          {error}
        </p>
      )}
    </div>
  );
}
