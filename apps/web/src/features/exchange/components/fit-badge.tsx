import type { FitDto } from '@app/shared';
import { cn } from '@/lib/cn';

const LABELS: Record<FitDto['status'], string> = {
  fits: 'Fits your boat',
  marginal: 'Marginal',
  'too-light': 'Too light',
  'not-rated': 'No rating to compare',
};
const TONES: Record<FitDto['status'], string> = {
  fits: 'border-kelp-700 bg-kelp-50 text-kelp-700',
  marginal: 'border-signal-600 bg-signal-50 text-signal-700',
  'too-light': 'border-flare-700 bg-flare-50 text-flare-700',
  'not-rated': 'border-sand-500 bg-sand-100 text-ink-700',
};

/** The fit flag; the reason shows on hover (title) and on tap (the details disclosure). */
export function FitBadge({ fit }: { fit: FitDto }) {
  return (
    <details className="text-sm">
      <summary
        title={fit.reason}
        className={cn(
          'inline-flex cursor-pointer list-none rounded-pill border px-2 py-0.5 font-bold',
          TONES[fit.status],
        )}
      >
        {LABELS[fit.status]}
        <span className="sr-only">: show why</span>
      </summary>
      <p className="mt-1 text-xs text-ink-700">{fit.reason}</p>
    </details>
  );
}
