import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useNotices } from '@/features/notices/api/get-notices';
import { HomeCard, HomeEmpty } from './home-card';
import { readableDate } from '@/lib/format-date';
import { countOf } from '@/lib/plural';

/** Unread notices (replies, answers, decisions), newest first. */
export function NoticesCard() {
  const notices = useNotices();
  const unread = (notices.data ?? []).filter((n) => n.readAt === null);
  return (
    <HomeCard title="Notices" more={{ to: paths.notices.href(), label: 'All notices' }}>
      {notices.isPending && <HomeEmpty>Loading your notices…</HomeEmpty>}
      {notices.isError && <HomeEmpty>Your notices could not be loaded.</HomeEmpty>}
      {notices.data && unread.length === 0 && (
        <HomeEmpty>Nothing new since you last looked.</HomeEmpty>
      )}
      {unread.length > 0 && (
        <>
          <p>{countOf(unread.length, 'unread notice', 'unread notices')}</p>
          <ul className="flex flex-col gap-1">
            {unread.slice(0, 4).map((n) => (
              <li key={n.id}>
                {n.link ? <Link to={n.link}>{n.message}</Link> : n.message}{' '}
                <span className="text-ink-600">· {readableDate(n.createdAt)}</span>
              </li>
            ))}
          </ul>
        </>
      )}
    </HomeCard>
  );
}
