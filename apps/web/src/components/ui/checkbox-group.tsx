import { useId, type InputHTMLAttributes, type Ref } from 'react';
import type { SelectOption } from './select-field';

export interface CheckboxGroupProps extends Omit<
  InputHTMLAttributes<HTMLInputElement>,
  'id' | 'type' | 'value'
> {
  legend: string;
  /** One checkbox each; all share the group's name, as react-hook-form's `register` gives it. */
  options: readonly SelectOption[];
  /** The group's error, shown under it and tied to it with aria-describedby. */
  error?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A fieldset of checkboxes for a list of values, with the group's error announced with it. */
export function CheckboxGroup({ legend, options, error, ref, ...inputProps }: CheckboxGroupProps) {
  const errorId = `${useId()}-error`;
  return (
    <fieldset className="flex flex-col gap-1" aria-describedby={error ? errorId : undefined}>
      <legend className="text-sm font-bold">{legend}</legend>
      {options.map((option) => (
        <label key={option.value} className="flex min-h-11 items-center gap-2">
          <input
            ref={ref}
            type="checkbox"
            value={option.value}
            className="size-5"
            {...inputProps}
          />
          {option.label}
        </label>
      ))}
      {error && (
        <p id={errorId} className="text-sm font-bold text-flare-700">
          {error}
        </p>
      )}
    </fieldset>
  );
}
