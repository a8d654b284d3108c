import type { ReactNode } from 'react';

export interface EmptyStateProps {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
}

/** What to show where a list has nothing in it: a title, a sentence, and maybe one action. */
export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div className="flex flex-col items-center gap-3 rounded-lg border border-dashed border-sand-500 bg-sand-50 px-6 py-10 text-center">
      <p className="text-lg font-bold text-ink-900">{title}</p>
      {children && <div className="max-w-prose text-sm text-ink-600">{children}</div>}
      {action}
    </div>
  );
}
