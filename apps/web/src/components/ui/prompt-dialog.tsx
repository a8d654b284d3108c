import { useCallback, useEffect, useId, useRef, useState, type FormEvent } from 'react';
import { Button } from './button';
import { DialogButtons } from './dialog-buttons';
import { Modal } from './modal';

export interface PromptOptions {
  title: string;
  /** The field's label, e.g. "Reason". */
  label: string;
  /** Shown under the label: who will read the answer, what it is for. */
  hint?: string;
  /** Text already in the field when the dialog opens. */
  initial?: string;
  /** Fewest characters (after trimming) that count as an answer; 0 allows an empty answer. Default 3. */
  minLength?: number;
  maxLength?: number;
  confirmLabel?: string;
  cancelLabel?: string;
  /** A one-line input instead of a text area (e.g. for a link address). */
  singleLine?: boolean;
  /** Extra check on the trimmed answer; return a message to show, or null when it is fine. */
  validate?: (value: string) => string | null;
  isDestructive?: boolean;
}

export interface PromptDialogProps {
  options: PromptOptions;
  onAnswer: (value: string | null) => void;
}

/**
 * A modal that asks for a short text (a reason for the log, a link address) on the native <dialog>:
 * focus goes to the field, Escape cancels, and focus returns where it was. The answer is validated
 * before the dialog closes, so the asker never receives an empty or too-short reason.
 */
export function PromptDialog({ options, onAnswer }: PromptDialogProps) {
  const fieldRef = useRef<HTMLInputElement & HTMLTextAreaElement>(null);
  const titleId = useId();
  const fieldId = useId();
  const hintId = `${fieldId}-hint`;
  const errorId = `${fieldId}-error`;
  const [value, setValue] = useState(options.initial ?? '');
  const [error, setError] = useState<string | null>(null);

  const minLength = options.minLength ?? 3;
  const describedBy = [options.hint ? hintId : null, error ? errorId : null]
    .filter(Boolean)
    .join(' ');

  const handleSubmit = (event: FormEvent) => {
    event.preventDefault();
    // React bubbles events through portals along the component tree: without this, a dialog opened from
    // inside another form (the post editor) would also submit that form.
    event.stopPropagation();
    const answer = value.trim();
    if (answer.length < minLength) {
      setError(
        minLength === 1
          ? `${options.label} is needed.`
          : `${options.label} needs at least ${minLength} characters.`,
      );
      return;
    }
    const problem = options.validate?.(answer) ?? null;
    if (problem) {
      setError(problem);
      return;
    }
    onAnswer(answer);
  };

  const fieldProps = {
    id: fieldId,
    value,
    maxLength: options.maxLength,
    'aria-invalid': error ? true : undefined,
    'aria-describedby': describedBy || undefined,
    className: `w-full rounded-md border bg-sand-50 px-3 text-base text-ink-950 ${
      error ? 'border-2 border-flare-700' : 'border-sand-500'
    }`,
  };

  return (
    <Modal
      labelledBy={titleId}
      onShown={() => {
        fieldRef.current?.focus();
        fieldRef.current?.select();
      }}
      onCancel={() => onAnswer(null)}
    >
      <form className="flex flex-col gap-4 p-5" onSubmit={handleSubmit} noValidate>
        <h2 id={titleId} className="text-xl">
          {options.title}
        </h2>
        <div className="flex flex-col gap-1">
          <label htmlFor={fieldId} className="text-sm font-bold">
            {options.label}
          </label>
          {options.hint && (
            <p id={hintId} className="text-xs text-ink-600">
              {options.hint}
            </p>
          )}
          {options.singleLine ? (
            <input
              ref={fieldRef}
              type="text"
              {...fieldProps}
              className={`min-h-11 ${fieldProps.className}`}
              onChange={(e) => setValue(e.target.value)}
            />
          ) : (
            <textarea
              ref={fieldRef}
              rows={3}
              {...fieldProps}
              className={`py-2 ${fieldProps.className}`}
              onChange={(e) => setValue(e.target.value)}
            />
          )}
          {error && (
            <p id={errorId} className="text-sm font-bold text-flare-700">
              {error}
            </p>
          )}
        </div>
        <DialogButtons onCancel={() => onAnswer(null)} cancelLabel={options.cancelLabel}>
          <Button type="submit" variant={options.isDestructive ? 'danger' : 'primary'}>
            {options.confirmLabel ?? 'Save'}
          </Button>
        </DialogButtons>
      </form>
    </Modal>
  );
}

/**
 * `const { ask, dialog } = usePromptDialog();` then `const reason = await ask({ title, label })`:
 * resolves to the trimmed answer, or null when the person cancels. Render `{dialog}` once.
 */
// The hook and its dialog belong together; fast refresh simply reloads this file in full.
// eslint-disable-next-line react-refresh/only-export-components
export function usePromptDialog() {
  const [options, setOptions] = useState<PromptOptions | null>(null);
  const [seq, setSeq] = useState(0);
  const resolver = useRef<((value: string | null) => void) | null>(null);

  const ask = useCallback((next: PromptOptions) => {
    resolver.current?.(null);
    setOptions(next);
    setSeq((n) => n + 1);
    return new Promise<string | null>((resolve) => {
      resolver.current = resolve;
    });
  }, []);

  const handleAnswer = useCallback((value: string | null) => {
    resolver.current?.(value);
    resolver.current = null;
    setOptions(null);
  }, []);

  useEffect(() => () => resolver.current?.(null), []);

  const dialog = options ? (
    <PromptDialog key={seq} options={options} onAnswer={handleAnswer} />
  ) : null;
  return { ask, dialog };
}
