import { SelectField, type SelectFieldProps } from './select-field';

export interface ChoiceFieldProps<T extends string> extends Omit<
  SelectFieldProps,
  'options' | 'value' | 'onChange'
> {
  options: readonly { value: T; label: string }[];
  value: T;
  /** Called with the chosen option's value, typed as the options' values. */
  onChoose: (value: T) => void;
}

/** A select over a closed list of values (a hull type, a chain grade), handing back the typed value. */
export function ChoiceField<T extends string>({ options, onChoose, ...rest }: ChoiceFieldProps<T>) {
  return (
    <SelectField
      options={options}
      onChange={(e) => {
        const chosen = options.find((option) => option.value === e.target.value);
        if (chosen) onChoose(chosen.value);
      }}
      {...rest}
    />
  );
}
