import { useId, type SelectHTMLAttributes } from 'react';
import { controlClassName, describedByOf } from '@/lib/form-control';
import { FieldFrame } from './field-frame';

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> {
  label: string;
  options: readonly SelectOption[];
  error?: string;
  hint?: string;
}

/** A labelled native select with its hint and error tied to it, matching the text fields. */
export function SelectField({
  label,
  options,
  error,
  hint,
  className,
  ...selectProps
}: SelectFieldProps) {
  const id = useId();
  return (
    <FieldFrame id={id} label={label} hint={hint} error={error} className={className}>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedByOf(id, hint, error)}
        className={controlClassName(error)}
        {...selectProps}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </FieldFrame>
  );
}
