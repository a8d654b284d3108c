import { useId, type InputHTMLAttributes, type Ref } from 'react';
import { cn } from '@/lib/cn';
import { controlClassName, describedByOf } from '@/lib/form-control';
import { FieldFrame } from './field-frame';

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
  return (
    <FieldFrame
      id={id}
      label={label}
      hint={hint}
      error={error}
      isRequired={inputProps.required}
      className={className}
    >
      <input
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedByOf(id, hint, error)}
        className={cn(controlClassName(error), 'placeholder:text-ink-600')}
        {...inputProps}
      />
    </FieldFrame>
  );
}
