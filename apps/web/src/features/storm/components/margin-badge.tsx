import type { MarginBand } from '@app/shared';
import { MARGIN_BAND_LABELS } from '@app/shared/values';
import { cn } from '@/lib/cn';

const BAND_STYLE: Record<MarginBand, { mark: string; className: string }> = {
  passes: { mark: '✓', className: 'border-kelp-700 bg-kelp-50 text-kelp-700' },
  tight: { mark: '!', className: 'border-signal-700 bg-signal-50 text-signal-700' },
  'below-wll': { mark: '✕', className: 'border-flare-700 bg-flare-50 text-flare-700' },
};

export interface MarginBadgeProps {
  band: MarginBand | null;
  /** The weakest part's WLL margin (WLL ÷ load), shown beside the word. */
  margin?: number | null;
}

/** The margin band as a word, a mark and a colour (never colour alone), with the figure when given. */
export function MarginBadge({ band, margin }: MarginBadgeProps) {
  if (band === null) return <span className="text-sm text-ink-700">No rated parts</span>;
  const style = BAND_STYLE[band];
  return (
    <span
      data-band={band}
      className={cn(
        'inline-flex items-center gap-1 rounded-md border px-2 py-0.5 text-sm font-bold whitespace-nowrap',
        style.className,
      )}
    >
      <span aria-hidden="true">{style.mark}</span>
      {MARGIN_BAND_LABELS[band]}
      {margin !== null && margin !== undefined && (
        <span className="font-normal">({margin.toFixed(2)} × WLL)</span>
      )}
    </span>
  );
}
