import { formatDateTime } from '@app/shared/locale';
import type { ThreadSummaryDto } from '@app/shared';
import { Link } from 'react-router-dom';

/** The inbox rows: listing, the other party, last message and unread count. */
export function ConversationList({
  threads,
  hrefOf,
}: {
  threads: ThreadSummaryDto[];
  hrefOf: (id: number) => string;
}) {
  return (
    <ul className="flex flex-col divide-y divide-sand-300 rounded-lg border border-sand-300 bg-sand-50">
      {threads.map((t) => (
        <li key={t.id} className="flex flex-col gap-1 p-3">
          <div className="flex flex-wrap items-center gap-2">
            <Link to={hrefOf(t.id)} className="font-bold">
              {t.listingTitle}
            </Link>
            {t.unread > 0 && (
              <span className="rounded-pill bg-signal-600 px-2 text-xs font-bold text-white">
                {t.unread} new
              </span>
            )}
            {t.soldToThisThread && (
              <span className="text-xs font-bold text-kelp-700">
                Sold to {t.role === 'buyer' ? 'you' : t.otherParty.displayName}
              </span>
            )}
          </div>
          <p className="text-sm text-ink-700">
            {t.role === 'buyer' ? 'Seller' : 'Buyer'}: {t.otherParty.displayName} ·{' '}
            {formatDateTime(t.lastMessageAt)}
          </p>
          <p className="truncate text-sm">{t.lastMessage}</p>
        </li>
      ))}
    </ul>
  );
}
