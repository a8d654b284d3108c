import { cn } from './cn';

/** The control's `aria-describedby`: its hint and error, as `FieldFrame` ids them. */
export function describedByOf(id: string, hint?: string, error?: string): string | undefined {
  const ids = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean);
  return ids.length > 0 ? ids.join(' ') : undefined;
}

/** The look of a one-line control (input, select), red-bordered when it has an error. */
export const controlClassName = (error?: string) =>
  cn(
    'min-h-11 w-full rounded-md border bg-sand-50 px-3 text-base text-ink-950',
    error ? 'border-2 border-flare-700' : 'border-sand-500',
  );
