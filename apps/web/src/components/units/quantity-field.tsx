import { useId, useState, type Ref } from 'react';
import { cn } from '@/lib/cn';
import { formatQuantity, otherSystem, quantityInputText } from '@/lib/units/format-quantity';
import { parseQuantity, QUANTITY_EXAMPLES, type QuantityKind } from '@/lib/units/parse-quantity';
import { useUnits } from '@/lib/units/use-units';

/** Whether a field is empty, holds a reading, or holds text it could not read. */
export type QuantityEntryState = 'empty' | 'ok' | 'invalid';

export interface QuantityFieldProps {
  label: string;
  kind: QuantityKind;
  /** The value in the kind's base unit (m, kg, N, kn); undefined when empty or unreadable. */
  value: number | undefined;
  /** Called on every edit with the reading (undefined when empty or unreadable) and which it is. */
  onValueChange: (value: number | undefined, state: QuantityEntryState) => void;
  /** An error from outside the field (the calculation's or the server's message). */
  error?: string;
  hint?: string;
  required?: boolean;
  name?: string;
  onBlur?: () => void;
  ref?: Ref<HTMLInputElement>;
  className?: string;
}

/**
 * A text field for a measured value that accepts either unit system ("32 ft", "9.75 m", "32'", or a
 * bare number in the chosen units), shows the reading in both systems, and shows what it could not
 * read next to the field. Switching units rewrites a bare entry so its meaning does not change.
 */
export function QuantityField({
  label,
  kind,
  value,
  onValueChange,
  error,
  hint,
  required,
  name,
  onBlur,
  ref,
  className,
}: QuantityFieldProps) {
  const { system } = useUnits();
  const id = useId();
  const initial = value === undefined ? '' : quantityInputText(value, kind, system);
  const [text, setText] = useState(initial);
  const [textSystem, setTextSystem] = useState(system);
  const [lastValue, setLastValue] = useState(value);
  // When the units change or the value is set from outside, show it anew in the current units.
  if (textSystem !== system || lastValue !== value) {
    setTextSystem(system);
    setLastValue(value);
    const parsed = parseQuantity(text, kind, system);
    if (value !== undefined && (!parsed.ok || Math.abs(parsed.value - value) > 1e-9)) {
      setText(quantityInputText(value, kind, system));
    }
  }
  const parsed = text.trim() === '' ? undefined : parseQuantity(text, kind, textSystem);
  const parseError = parsed && !parsed.ok ? parsed.error : undefined;
  const shownError = parseError ?? error;
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const readBack =
    parsed?.ok === true
      ? `${formatQuantity(parsed.value, kind, system)} · ${formatQuantity(parsed.value, kind, otherSystem(system))}`
      : undefined;

  const handleChange = (next: string) => {
    setText(next);
    const result = next.trim() === '' ? undefined : parseQuantity(next, kind, system);
    const nextValue = result?.ok === true ? result.value : undefined;
    setLastValue(nextValue);
    onValueChange(nextValue, result === undefined ? 'empty' : result.ok ? 'ok' : 'invalid');
  };

  return (
    <div className={cn('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-sm font-bold text-ink-900">
        {label}
        {required && <span className="sr-only"> (required)</span>}
      </label>
      <p id={hintId} className="text-xs text-ink-600">
        {hint ?? `e.g. ${QUANTITY_EXAMPLES[kind]}`}
      </p>
      <input
        ref={ref}
        id={id}
        name={name}
        inputMode="text"
        autoComplete="off"
        value={text}
        onChange={(event) => handleChange(event.target.value)}
        onBlur={onBlur}
        aria-invalid={shownError ? true : undefined}
        aria-describedby={[hintId, shownError ? errorId : null].filter(Boolean).join(' ')}
        className={cn(
          'min-h-11 w-full rounded-md border bg-sand-50 px-3 text-base text-ink-950',
          shownError ? 'border-2 border-flare-700' : 'border-sand-500',
        )}
      />
      {readBack && !shownError && (
        <p className="text-xs text-ink-600" aria-live="polite">
          Reads as {readBack}
        </p>
      )}
      {shownError && (
        <p id={errorId} className="text-sm font-bold text-flare-700">
          {shownError}
        </p>
      )}
    </div>
  );
}
