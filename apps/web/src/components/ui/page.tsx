import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export interface PageProps {
  /** The h1 and the start of the document title. */
  title: string;
  intro?: ReactNode;
  /** `narrow` for forms, `wide` for tables and dashboards. */
  width?: 'narrow' | 'wide';
  children?: ReactNode;
}

/** A screen's frame: document title, one h1, an optional intro, then the content. */
export function Page({ title, intro, width = 'wide', children }: PageProps) {
  return (
    <div
      className={cn(
        'mx-auto flex w-full flex-col gap-6',
        width === 'narrow' ? 'max-w-md' : 'max-w-5xl',
      )}
    >
      <title>{`${title} · Rodewise`}</title>
      <header className="flex flex-col gap-2">
        <h1 className="text-2xl sm:text-3xl">{title}</h1>
        {intro && <div className="max-w-prose text-base text-ink-700">{intro}</div>}
      </header>
      {children}
    </div>
  );
}
