import { useId, type Ref, type SelectHTMLAttributes } from 'react';
import { cn } from '@/lib/cn';

export interface ExchangeSelectProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  label: string;
  options: ReadonlyArray<{ value: string; label: string }>;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
}

/** A labelled native select with its error tied to it. */
export function ExchangeSelect({
  label,
  options,
  error,
  className,
  ref,
  ...rest
}: ExchangeSelectProps) {
  const id = useId();
  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-bold text-ink-900">
        {label}
      </label>
      <select
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={cn(
          'min-h-11 w-full rounded-md border bg-sand-50 px-3 text-base text-ink-950',
          error ? 'border-2 border-flare-700' : 'border-sand-500',
        )}
        {...rest}
      >
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {error && (
        <p id={`${id}-error`} className="text-sm font-bold text-flare-700">
          {error}
        </p>
      )}
    </div>
  );
}
