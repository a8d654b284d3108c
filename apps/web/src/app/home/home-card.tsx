import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

export interface HomeCardProps {
  title: string;
  /** A link at the foot of the card to the full screen. */
  more?: { to: string; label: string };
  children: ReactNode;
}

/** One panel of the home screen: a heading, its content and a link onward. */
export function HomeCard({ title, more, children }: HomeCardProps) {
  return (
    <section
      aria-label={title}
      className="flex flex-col gap-3 rounded-lg border border-sand-300 bg-sand-50 p-5 shadow-card"
    >
      <h2 className="text-lg">{title}</h2>
      <div className="flex flex-1 flex-col gap-2 text-sm text-ink-800">{children}</div>
      {more && (
        <Link to={more.to} className="self-start font-bold">
          {more.label}
        </Link>
      )}
    </section>
  );
}

/** A quiet line for a card with nothing to show. */
export function HomeEmpty({ children }: { children: ReactNode }) {
  return <p className="text-ink-600">{children}</p>;
}

/**
 * A card's waiting line, in a box as tall as the four lines that usually replace it (two each on a phone, where the
 * titles wrap), so the cards below do not jump down when the list arrives.
 */
export function HomeLoading({ children }: { children: ReactNode }) {
  return (
    <div className="min-h-46 md:min-h-24">
      <HomeEmpty>{children}</HomeEmpty>
    </div>
  );
}
