import { useEffect, useId, useRef, useState } from 'react';
import { NavLink, useNavigate } from 'react-router-dom';
import {
  navEntries,
  navFor,
  type NavBadge,
  type NavEntry,
  type NavGroupId,
  type NavItem,
} from '@/config/nav';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { useCurrentUser } from '@/features/auth/api/get-session';
import { useLogout } from '@/features/auth/api/logout';
import { useUnread } from '@/features/conversations/api/get-unread';
import { useModerationCount } from '@/features/moderation/api/get-queue';
import { useUnreadNotices } from '@/features/notices/api/get-notices';

const ITEM_CLASSES =
  'flex min-h-11 items-center rounded-md px-3 md:px-2 xl:px-3 font-bold text-sand-100 no-underline hover:bg-ink-800 hover:text-white';

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

function ChevronIcon({ isOpen }: { isOpen: boolean }) {
  return (
    <svg
      aria-hidden="true"
      viewBox="0 0 24 24"
      className="size-4"
      fill="none"
      stroke="currentColor"
    >
      <path
        strokeWidth="2.2"
        strokeLinecap="round"
        strokeLinejoin="round"
        d={isOpen ? 'M6 15l6-6 6 6' : 'M6 9l6 6 6-6'}
      />
    </svg>
  );
}

/**
 * The role-aware main navigation: the club's areas in the bar, the officers' desks and the person's own
 * things each under one menu button; on phones one menu button opens everything, groups under headings.
 */
export function MainNav() {
  const { user } = useCurrentUser();
  const logout = useLogout();
  const navigate = useNavigate();
  const [isOpen, setIsOpen] = useState(false);
  const [openGroup, setOpenGroup] = useState<NavGroupId | null>(null);
  const navRef = useRef<HTMLElement>(null);
  const listId = useId();
  const closeAll = () => {
    setIsOpen(false);
    setOpenGroup(null);
  };
  // A click or tap outside the navigation closes an open group menu.
  useEffect(() => {
    if (!openGroup) return;
    const onPointer = (event: PointerEvent) => {
      if (navRef.current && !navRef.current.contains(event.target as Node)) setOpenGroup(null);
    };
    document.addEventListener('pointerdown', onPointer);
    return () => document.removeEventListener('pointerdown', onPointer);
  }, [openGroup]);
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
  const renderCount = (count: number) =>
    count > 0 && (
      <span
        aria-hidden="true"
        className="ml-2 inline-flex min-w-6 items-center justify-center rounded-pill bg-signal-400 px-1.5 text-xs font-bold text-ink-950"
      >
        {count > 99 ? '99+' : count}
      </span>
    );

  const renderItem = (item: NavItem) => {
    if (item.kind === 'link') {
      const count = badgeCount(item.badge);
      return (
        <NavLink
          to={item.to}
          end={item.end}
          aria-label={count > 0 ? `${item.label}, ${count} ${badgeWord(item.badge)}` : undefined}
          onClick={closeAll}
          className={({ isActive }) =>
            cn(
              ITEM_CLASSES,
              isActive &&
                'bg-ink-800 text-white underline decoration-signal-400 decoration-2 underline-offset-6',
            )
          }
        >
          {item.label}
          {renderCount(count)}
        </NavLink>
      );
    }
    return (
      <button
        type="button"
        disabled={logout.isPending}
        className={cn(ITEM_CLASSES, 'w-full cursor-pointer')}
        onClick={() =>
          logout.mutate(undefined, {
            onSuccess: () => {
              closeAll();
              void navigate(paths.home.href());
            },
          })
        }
      >
        {logout.isPending ? 'Signing out…' : item.label}
      </button>
    );
  };

  const renderEntry = (entry: NavEntry) => {
    if (entry.kind === 'item') return <li key={entry.item.id}>{renderItem(entry.item)}</li>;
    const { group, items: inside } = entry;
    const badges = inside.flatMap((item) =>
      item.kind === 'link' && item.badge ? [item.badge] : [],
    );
    const count = badges.reduce((sum, badge) => sum + badgeCount(badge), 0);
    const word = badges.every((b) => b === 'moderation-waiting') ? 'waiting' : 'unread';
    const isGroupOpen = openGroup === group.id;
    const subId = `${listId}-${group.id}`;
    return (
      <li key={group.id} className="md:relative">
        <button
          type="button"
          aria-expanded={isGroupOpen}
          aria-controls={subId}
          aria-label={count > 0 ? `${group.label}, ${count} ${word}` : undefined}
          onClick={() => setOpenGroup(isGroupOpen ? null : group.id)}
          className={cn(
            ITEM_CLASSES,
            'hidden cursor-pointer gap-1 md:flex',
            isGroupOpen && 'bg-ink-800',
          )}
        >
          {group.label}
          {renderCount(count)}
          <ChevronIcon isOpen={isGroupOpen} />
        </button>
        <p
          aria-hidden="true"
          className="mt-2 border-t border-ink-700 px-3 pt-2 text-xs font-bold tracking-wide text-sand-300 uppercase md:hidden"
        >
          {group.label}
        </p>
        <ul
          id={subId}
          aria-label={group.label}
          className={cn(
            'flex flex-col gap-1',
            isGroupOpen
              ? 'md:absolute md:right-0 md:z-50 md:mt-2 md:w-60 md:rounded-lg md:bg-ink-900 md:p-2 md:shadow-card'
              : 'md:hidden',
          )}
        >
          {inside.map((item) => (
            <li key={item.id}>{renderItem(item)}</li>
          ))}
        </ul>
      </li>
    );
  };

  return (
    <nav
      ref={navRef}
      aria-label="Main"
      className="relative md:flex md:min-w-0 md:flex-1"
      onKeyDown={(event) => {
        if (event.key !== 'Escape') return;
        if (openGroup) {
          // Back to the group's button, so the keyboard user stays where they were.
          const button = navRef.current?.querySelector<HTMLButtonElement>(
            `[aria-controls="${listId}-${openGroup}"]`,
          );
          setOpenGroup(null);
          button?.focus();
          return;
        }
        setIsOpen(false);
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
          'absolute right-0 z-40 mt-2 max-h-[calc(100vh-5rem)] w-[min(18rem,calc(100vw-2rem))] flex-col gap-1 overflow-y-auto rounded-lg bg-ink-900 p-2 shadow-card',
          'md:static md:mt-0 md:flex md:max-h-none md:w-auto md:flex-1 md:flex-row md:flex-nowrap md:items-center md:overflow-visible md:bg-transparent md:p-0 md:whitespace-nowrap md:shadow-none',
          isOpen ? 'flex' : 'hidden',
        )}
      >
        {navEntries(items, 'primary').map(renderEntry)}
        <li aria-hidden="true" className="hidden md:block md:flex-1" />
        {navEntries(items, 'account').map(renderEntry)}
      </ul>
    </nav>
  );
}
