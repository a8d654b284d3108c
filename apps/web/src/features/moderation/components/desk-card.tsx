import type { MouseEvent, ReactNode } from 'react';
import { Button, type ButtonVariant } from '@/components/ui/button';
import { cn } from '@/lib/cn';
import { DecidedLine, DeskAlerts } from './decision-desk';
import { keptHeight, type DecisionDesk } from './use-decision-desk';

/** One decision button on a card. */
export interface DeskAction {
  label: ReactNode;
  /** The button's accessible name where the label alone would not say which item it acts on. */
  ariaLabel?: string;
  variant?: ButtonVariant;
  /** This button shows the spinner while the decision is sent; the others are only disabled. */
  showsPending?: boolean;
  onClick: (e: MouseEvent) => void;
}

export interface DeskCardProps {
  desk: DecisionDesk;
  itemKey: string;
  /** What the decided line's Undo names. */
  title: string;
  /** `report`: the red border of something a member reported. */
  tone?: 'waiting' | 'report';
  /** The last one sits at the far end (the refusal, away from the others). */
  actions: DeskAction[];
  children: ReactNode;
}

/**
 * One item on a moderation desk: what it is (children), then its decision buttons or, once decided, what
 * happened with Undo. The card keeps the height it had when decided.
 */
export function DeskCard({
  desk,
  itemKey,
  title,
  tone = 'waiting',
  actions,
  children,
}: DeskCardProps) {
  const decided = desk.decidedOf(itemKey);
  const isPending = desk.isPending(itemKey);
  return (
    <li
      style={keptHeight(decided)}
      className={cn(
        'flex min-w-0 flex-col gap-2 rounded-md border bg-sand-50 p-3',
        tone === 'report' ? 'border-flare-700' : 'border-sand-500',
      )}
    >
      {children}
      {decided ? (
        <DecidedLine desk={desk} itemKey={itemKey} title={title} />
      ) : (
        <div className="flex flex-wrap gap-2">
          {actions.map((action, i) => (
            <Button
              key={i}
              size="sm"
              variant={action.variant}
              className={i > 0 && i === actions.length - 1 ? 'sm:ml-auto' : undefined}
              disabled={isPending}
              isPending={action.showsPending && isPending}
              aria-label={action.ariaLabel}
              onClick={action.onClick}
            >
              {action.label}
            </Button>
          ))}
        </div>
      )}
    </li>
  );
}

/** A desk's list under its heading, with a line saying so when nothing is waiting. */
export function DeskSection({
  id,
  heading,
  count,
  emptyText = 'Nothing waiting.',
  ownDesk,
  children,
}: {
  id: string;
  heading: string;
  /** How many cards are shown (decided ones included). */
  count: number;
  emptyText?: string;
  /** A section with a desk of its own shows that desk's alerts under its heading. */
  ownDesk?: DecisionDesk;
  children: ReactNode;
}) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-2">
      <h2 id={id} className="text-xl">
        {heading}
      </h2>
      {ownDesk && <DeskAlerts desk={ownDesk} />}
      {count === 0 && <p>{emptyText}</p>}
      <ul className="flex flex-col gap-3">{children}</ul>
    </section>
  );
}
