import { formatDateTime } from '@app/shared/locale';
import type { NotificationDto } from '@app/shared';
import { Link } from 'react-router-dom';
import { cn } from '@/lib/cn';

const KIND_LABELS: Record<string, string> = {
  reply: 'Reply',
  accepted: 'Your answer worked',
  moderation: 'Moderation',
  report: 'Your report',
  'listing-sold-to-you': 'Exchange: sold to you',
  'listing-sold': 'Exchange: sold',
  'listing-sale-undone': 'Exchange: sale undone',
};

export interface NoticeListProps {
  notices: NotificationDto[];
  /** Called when the member follows an unread notice's link, so it can be marked read. */
  onOpen?: (notice: NotificationDto) => void;
}

/** The member's notices, newest first; unread ones are marked "New" (in words, not only by colour). */
export function NoticeList({ notices, onOpen }: NoticeListProps) {
  return (
    <ul className="flex flex-col divide-y divide-sand-300 rounded-lg border border-sand-300 bg-sand-50">
      {notices.map((n) => {
        const isUnread = n.readAt === null;
        return (
          <li
            key={n.id}
            className={cn('flex flex-col gap-1 p-3', isUnread && 'border-l-4 border-l-signal-600')}
          >
            <div className="flex flex-wrap items-center gap-2 text-sm text-ink-700">
              {isUnread && (
                <span className="rounded-pill bg-signal-600 px-2 text-xs font-bold text-white">
                  New
                </span>
              )}
              <span className="font-bold">{KIND_LABELS[n.kind] ?? 'Notice'}</span>
              <span aria-hidden="true">·</span>
              <time dateTime={n.createdAt}>{formatDateTime(n.createdAt)}</time>
            </div>
            {n.link ? (
              <Link
                to={n.link}
                className={cn('text-base', isUnread && 'font-bold')}
                onClick={() => {
                  if (isUnread) onOpen?.(n);
                }}
              >
                {n.message}
              </Link>
            ) : (
              <p className={cn('text-base', isUnread && 'font-bold')}>{n.message}</p>
            )}
          </li>
        );
      })}
    </ul>
  );
}
