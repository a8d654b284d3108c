import type { ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';

export interface ResultItem {
  label: string;
  value: ReactNode;
}

/** Results as a definition list, announced politely as they change. */
export function ResultList({ items, label }: { items: readonly ResultItem[]; label: string }) {
  return (
    <dl
      aria-label={label}
      aria-live="polite"
      className="grid grid-cols-1 gap-x-4 gap-y-1 rounded-md bg-sand-100 p-3 text-sm sm:grid-cols-[auto_1fr]"
    >
      {items.map((item) => (
        <div key={item.label} className="contents">
          <dt className="font-bold text-ink-700">{item.label}</dt>
          <dd className="mb-1 text-base font-bold text-ink-950 sm:mb-0">{item.value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** Warnings from a calculation, if any. */
export function WarningList({ warnings }: { warnings: readonly string[] }) {
  if (warnings.length === 0) return null;
  return (
    <Alert tone="warning" title="Check these">
      <ul className="list-disc pl-5">
        {warnings.map((w) => (
          <li key={w}>{w}</li>
        ))}
      </ul>
    </Alert>
  );
}

/** Why no result is shown: the calculation's message or a missing value. */
export function NoResult({ message }: { message: string }) {
  return (
    <p role="status" className="rounded-md bg-sand-100 p-3 text-sm text-ink-700">
      {message}
    </p>
  );
}
