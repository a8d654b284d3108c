import type { ReactNode } from 'react';

export interface TitledSectionProps {
  /** The heading's id; the section is labelled by its heading. */
  headingId: string;
  title: ReactNode;
  /** h2 by default; h3 for a section inside another one. */
  level?: 2 | 3;
  /** The section's classes: a column with gap-3 unless given. */
  className?: string;
  /** The heading's classes: text-xl unless given. */
  headingClassName?: string;
  children?: ReactNode;
}

/** A section named by its own heading (`aria-labelledby`), so it is listed as a landmark region. */
export function TitledSection({
  headingId,
  title,
  level = 2,
  className = 'flex flex-col gap-3',
  headingClassName = 'text-xl',
  children,
}: TitledSectionProps) {
  const Heading = level === 2 ? 'h2' : 'h3';
  return (
    <section aria-labelledby={headingId} className={className}>
      <Heading id={headingId} className={headingClassName}>
        {title}
      </Heading>
      {children}
    </section>
  );
}
