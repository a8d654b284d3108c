import { cn } from '@/lib/cn';

export interface SpinnerProps {
  /** Read out to screen readers; also shown next to the spinner unless `hideLabel`. */
  label?: string;
  hideLabel?: boolean;
  className?: string;
}

/** A small busy indicator with a spoken label (role="status"). */
export function Spinner({ label = 'Loading…', hideLabel = false, className }: SpinnerProps) {
  return (
    <span role="status" className={cn('inline-flex items-center gap-2 text-ink-600', className)}>
      <span
        aria-hidden="true"
        className="size-4 animate-spin rounded-pill border-2 border-current border-r-transparent"
      />
      <span className={hideLabel ? 'sr-only' : 'text-sm'}>{label}</span>
    </span>
  );
}
