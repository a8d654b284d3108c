import type { ReadinessStatus } from '@app/shared';
import { READINESS_STATUS_LABELS } from '@app/shared/values';
import { cn } from '@/lib/cn';

const STATUS_CLASS: Record<ReadinessStatus, string> = {
  'not-started': 'border-sand-500 bg-sand-50 text-ink-800',
  'in-progress': 'border-ink-700 bg-sand-50 text-ink-800',
  ready: 'border-kelp-700 bg-kelp-50 text-kelp-700',
  'help-wanted': 'border-flare-700 bg-flare-50 text-flare-700',
  away: 'border-ink-600 bg-sand-200 text-ink-800',
};

/** A boat's readiness status as its word on a tinted chip. */
export function StatusBadge({ status }: { status: ReadinessStatus }) {
  return (
    <span
      data-status={status}
      className={cn(
        'inline-flex rounded-md border px-2 py-0.5 text-sm font-bold whitespace-nowrap',
        STATUS_CLASS[status],
      )}
    >
      {READINESS_STATUS_LABELS[status]}
    </span>
  );
}
