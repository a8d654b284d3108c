import type { DuesStatus } from '@app/shared';
import { DUES_STATUS_LABELS } from '@app/shared/values';
import { cn } from '@/lib/cn';

const TONES: Record<DuesStatus, string> = {
  current: 'bg-kelp-50 text-kelp-700 border-kelp-700',
  due: 'bg-signal-50 text-signal-700 border-signal-600',
  overdue: 'bg-flare-50 text-flare-800 border-flare-700',
  lapsed: 'bg-sand-200 text-ink-800 border-sand-500',
};

/** A dues status as a labelled pill; the word carries the meaning, the colour only repeats it. */
export function DuesStatusBadge({ status }: { status: DuesStatus | null }) {
  if (!status) return <span className="text-sm text-ink-600">No membership</span>;
  return (
    <span
      className={cn(
        'inline-block rounded-pill border px-2 py-0.5 text-xs font-bold uppercase tracking-wide',
        TONES[status],
      )}
    >
      {DUES_STATUS_LABELS[status]}
    </span>
  );
}
