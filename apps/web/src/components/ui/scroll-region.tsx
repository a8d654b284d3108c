import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';

export interface ScrollRegionProps {
  /** Names the region for screen readers, e.g. the table's caption. */
  label: string;
  className?: string;
  children: ReactNode;
}

/**
 * A box that scrolls sideways on narrow screens (wide tables). It is focusable and named, so keyboard
 * users can scroll it with the arrow keys and screen readers announce what it holds (WCAG 2.1.1).
 */
export function ScrollRegion({ label, className, children }: ScrollRegionProps) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className={cn('overflow-x-auto', className)}>
      {children}
    </div>
  );
}
