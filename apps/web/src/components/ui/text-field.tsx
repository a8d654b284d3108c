import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { cn } from '@/lib/cn';

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> {
  label: string;
  /** The field's error, shown under it and tied to it with aria-describedby. */
  error?: string;
  /** Help text under the label, also tied with aria-describedby. */
  hint?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A labelled input whose hint and error are announced with it (aria-describedby, aria-invalid). */
export function TextField({ label, error, hint, className, ref, ...inputProps }: TextFieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(' ');
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-bold text-ink-900">
        {label}
        {inputProps.required && <span className="sr-only"> (required)</span>}
      </label>
      {hint && (
        <p id={hintId} className="text-xs text-ink-600">
          {hint}
        </p>
      )}
      <input
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy || undefined}
        className={cn(
          'min-h-11 w-full rounded-md border bg-sand-50 px-3 text-base text-ink-950',
          'placeholder:text-ink-600',
          error ? 'border-2 border-flare-700' : 'border-sand-500',
        )}
        {...inputProps}
      />
      {error && (
        <p id={errorId} className="text-sm font-bold text-flare-700">
          {error}
        </p>
      )}
    </div>
  );
}
