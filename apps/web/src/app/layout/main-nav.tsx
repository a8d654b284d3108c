import { useId, useState } from 'react';
import { NavLink, useNavigate } from 'react-router-dom';
import { navFor, type NavBadge, type NavItem } from '../../config/nav';
import { paths } from '../../config/paths';
import { cn } from '../../lib/cn';
import { useCurrentUser } from '../../features/auth/api/get-session';
import { useLogout } from '../../features/auth/api/logout';
import { useUnread } from '../../features/messages/api/get-unread';
import { useModerationCount } from '../../features/moderation/api/get-queue';
import { useUnreadNotices } from '../../features/notifications/api/get-notices';

const ITEM_CLASSES =
  'flex min-h-11 items-center rounded-md px-3 font-bold text-sand-100 no-underline hover:bg-ink-800 hover:text-white';

function MenuIcon({ isOpen }: { isOpen: boolean }) {
  return (
    <svg
      aria-hidden="true"
      viewBox="0 0 24 24"
      className="size-5"
      fill="none"
      stroke="currentColor"
    >
      {isOpen ? (
        <path strokeWidth="2.2" strokeLinecap="round" d="M6 6l12 12M18 6L6 18" />
      ) : (
        <path strokeWidth="2.2" strokeLinecap="round" d="M4 7h16M4 12h16M4 17h16" />
      )}
    </svg>
  );
}

/** The role-aware main navigation; on phones a menu button opens it. */
export function MainNav() {
  const { user } = useCurrentUser();
  const logout = useLogout();
  const navigate = useNavigate();
  const [isOpen, setIsOpen] = useState(false);
  const listId = useId();
  // Until the session is known show only what everyone sees, so sign-in links don't flash for members.
  const items =
    user === undefined ? navFor(null).filter((item) => item.signedIn === undefined) : navFor(user);
  const shows = (badge: NavBadge) =>
    items.some((item) => item.kind === 'link' && item.badge === badge);
  const waiting = useModerationCount(shows('moderation-waiting'));
  const unread = useUnread(shows('messages-unread'));
  const notices = useUnreadNotices(shows('notices-unread'));
  const counts: Record<NavBadge, number> = {
    'moderation-waiting': waiting.data?.total ?? 0,
    'messages-unread': unread.data?.unread ?? 0,
    'notices-unread': notices.data?.unread ?? 0,
  };
  const badgeCount = (badge: NavBadge | undefined) => (badge ? counts[badge] : 0);
  const badgeWord = (badge: NavBadge | undefined) =>
    badge === 'moderation-waiting' ? 'waiting' : 'unread';

  const renderItem = (item: NavItem) => {
    if (item.kind === 'link') {
      const count = badgeCount(item.badge);
      return (
        <NavLink
          to={item.to}
          end={item.end}
          aria-label={count > 0 ? `${item.label}, ${count} ${badgeWord(item.badge)}` : undefined}
          onClick={() => setIsOpen(false)}
          className={({ isActive }) =>
            cn(
              ITEM_CLASSES,
              isActive &&
                'bg-ink-800 text-white underline decoration-signal-400 decoration-2 underline-offset-6',
            )
          }
        >
          {item.label}
          {count > 0 && (
            <span
              aria-hidden="true"
              className="ml-2 inline-flex min-w-6 items-center justify-center rounded-pill bg-signal-400 px-1.5 text-xs font-bold text-ink-950"
            >
              {count > 99 ? '99+' : count}
            </span>
          )}
        </NavLink>
      );
    }
    return (
      <button
        type="button"
        disabled={logout.isPending}
        className={cn(ITEM_CLASSES, 'w-full cursor-pointer md:w-auto')}
        onClick={() =>
          logout.mutate(undefined, {
            onSuccess: () => {
              setIsOpen(false);
              void navigate(paths.home.href());
            },
          })
        }
      >
        {logout.isPending ? 'Signing out…' : item.label}
      </button>
    );
  };

  const primary = items.filter((item) => item.section === 'primary');
  const account = items.filter((item) => item.section === 'account');
  return (
    <nav
      aria-label="Main"
      className="relative md:flex md:min-w-0 md:flex-1"
      onKeyDown={(event) => {
        if (event.key === 'Escape') setIsOpen(false);
      }}
    >
      <button
        type="button"
        aria-expanded={isOpen}
        aria-controls={listId}
        onClick={() => setIsOpen((open) => !open)}
        className="flex min-h-11 items-center gap-2 rounded-md border border-ink-700 px-3 font-bold text-sand-100 md:hidden"
      >
        <MenuIcon isOpen={isOpen} />
        Menu
      </button>
      <ul
        id={listId}
        className={cn(
          'absolute right-0 z-40 mt-2 w-[min(18rem,calc(100vw-2rem))] flex-col gap-1 rounded-lg bg-ink-900 p-2 shadow-card',
          'md:static md:mt-0 md:flex md:w-auto md:flex-1 md:flex-row md:flex-wrap md:items-center md:bg-transparent md:p-0 md:shadow-none',
          isOpen ? 'flex' : 'hidden',
        )}
      >
        {primary.map((item) => (
          <li key={item.id}>{renderItem(item)}</li>
        ))}
        <li aria-hidden="true" className="hidden md:block md:flex-1" />
        {account.map((item) => (
          <li key={item.id}>{renderItem(item)}</li>
        ))}
      </ul>
    </nav>
  );
}
