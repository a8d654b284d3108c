import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export type AlertTone = 'info' | 'success' | 'warning' | 'error';

export interface AlertProps {
  tone?: AlertTone;
  title?: string;
  children?: ReactNode;
  /** Extra content on the right, e.g. an "Undo" button. */
  action?: ReactNode;
  className?: string;
}

const TONE_CLASSES: Record<AlertTone, string> = {
  info: 'border-ink-700 bg-sand-50',
  success: 'border-kelp-700 bg-kelp-50',
  warning: 'border-signal-600 bg-signal-50',
  error: 'border-flare-700 bg-flare-50',
};

/** A message box; errors use role="alert", the rest role="status" so they are announced politely. */
export function Alert({ tone = 'info', title, children, action, className }: AlertProps) {
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={cn(
        'flex flex-col gap-3 rounded-md border-l-4 px-4 py-3 text-ink-900 sm:flex-row sm:items-start',
        TONE_CLASSES[tone],
        className,
      )}
    >
      <div className="flex-1 text-sm">
        {title && <p className="font-bold">{title}</p>}
        {children}
      </div>
      {action && <div className="shrink-0">{action}</div>}
    </div>
  );
}
