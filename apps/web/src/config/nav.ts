import type { Role, UserDto } from '@app/shared';
import { paths } from './paths';

/** Where an item sits: `primary` = the club's areas, `account` = the person's own links at the end. */
export type NavSection = 'primary' | 'account';

/**
 * A menu that gathers several items under one button on wide screens (on a phone the menu lists them
 * under a heading). `desks` = the officers' work, `account` = the signed-in person's own things.
 */
export type NavGroupId = 'desks' | 'account';

export interface NavGroup {
  id: NavGroupId;
  label: string;
  section: NavSection;
}

/** The groups, in display order within their section. */
export const NAV_GROUPS: readonly NavGroup[] = [
  { id: 'desks', label: 'Desks', section: 'primary' },
  { id: 'account', label: 'Account', section: 'account' },
];

interface NavItemBase {
  /** Stable id, also the React key. */
  id: string;
  label: string;
  section: NavSection;
  /** Shown only to signed-in people holding at least one of these roles (implies signed in). */
  roles?: readonly Role[];
  /** true: signed-in people only; false: visitors only; left out: everyone. */
  signedIn?: boolean;
  /** The menu this item sits in; left out: shown on its own in the bar. */
  group?: NavGroupId;
}

export interface NavLinkItem extends NavItemBase {
  kind: 'link';
  to: string;
  /** Mark as current only on an exact path match (for `/`). */
  end?: boolean;
  /** A live count shown beside the label (and read out with it), e.g. items waiting for a moderator. */
  badge?: NavBadge;
}

/** The counts a navigation item can carry. */
export type NavBadge = 'moderation-waiting' | 'messages-unread' | 'notices-unread';

/** A button that runs an action instead of following a link. */
export interface NavActionItem extends NavItemBase {
  kind: 'action';
  action: 'sign-out';
}

export type NavItem = NavLinkItem | NavActionItem;

/**
 * Every navigation item, in display order. To add an area, add its path to `config/paths.ts` and one entry
 * here, e.g. `{ id: 'treasury', kind: 'link', label: 'Treasury', to: paths.treasury.href(), section: 'primary',
 * roles: ['treasurer'], group: 'desks' }`. Leave `group` out for an item of its own in the bar; the bar holds
 * the four club areas plus one or two menus, so keep new top-level items rare (1024 px must not wrap).
 */
export const NAV_ITEMS: readonly NavItem[] = [
  { id: 'home', kind: 'link', label: 'Home', to: paths.home.href(), end: true, section: 'primary' },
  {
    id: 'knowledge',
    kind: 'link',
    label: 'Knowledge',
    to: paths.knowledge.href(),
    section: 'primary',
  },
  {
    id: 'calculators',
    kind: 'link',
    label: 'Calculators',
    to: paths.calculators.href(),
    section: 'primary',
  },
  {
    id: 'exchange',
    kind: 'link',
    label: 'Exchange',
    to: paths.exchange.href(),
    section: 'primary',
  },
  {
    id: 'messages',
    kind: 'link',
    label: 'Messages',
    to: paths.messages.href(),
    section: 'primary',
    signedIn: true,
    badge: 'messages-unread',
    group: 'account',
  },
  {
    id: 'boats',
    kind: 'link',
    label: 'My boats',
    to: paths.boats.href(),
    section: 'primary',
    signedIn: true,
    group: 'account',
  },
  {
    id: 'storm',
    kind: 'link',
    label: 'Storm watch',
    to: paths.storm.href(),
    section: 'primary',
    signedIn: true,
  },
  {
    id: 'dues',
    kind: 'link',
    label: 'Dues',
    to: paths.dues.href(),
    section: 'primary',
    roles: ['member'],
    group: 'account',
  },
  {
    id: 'treasury',
    kind: 'link',
    label: 'Treasury',
    to: paths.treasury.href(),
    section: 'primary',
    roles: ['treasurer'],
    group: 'desks',
  },
  {
    id: 'moderation',
    kind: 'link',
    label: 'Moderation',
    to: paths.moderation.href(),
    section: 'primary',
    roles: ['moderator'],
    badge: 'moderation-waiting',
    group: 'desks',
  },
  {
    id: 'admin-users',
    kind: 'link',
    label: 'Admin',
    to: paths.adminUsers.href(),
    section: 'primary',
    roles: ['admin'],
    group: 'desks',
  },
  {
    id: 'sign-in',
    kind: 'link',
    label: 'Sign in',
    to: paths.signIn.href(),
    section: 'account',
    signedIn: false,
  },
  {
    id: 'sign-up',
    kind: 'link',
    label: 'Join',
    to: paths.signUp.href(),
    section: 'account',
    signedIn: false,
  },
  {
    id: 'notices',
    kind: 'link',
    label: 'Notices',
    to: paths.notices.href(),
    section: 'account',
    signedIn: true,
    badge: 'notices-unread',
    group: 'account',
  },
  {
    id: 'account',
    kind: 'link',
    label: 'Settings',
    to: paths.account.href(),
    section: 'account',
    signedIn: true,
    group: 'account',
  },
  {
    id: 'sign-out',
    kind: 'action',
    label: 'Sign out',
    action: 'sign-out',
    section: 'account',
    signedIn: true,
    group: 'account',
  },
];

/** Whether `user` (null for a visitor) may see `item`. */
export function canSee(item: NavItem, user: Pick<UserDto, 'roles'> | null): boolean {
  if (item.signedIn === true && !user) return false;
  if (item.signedIn === false && user) return false;
  if (item.roles) return user !== null && item.roles.some((role) => user.roles.includes(role));
  return true;
}

/** The navigation items `user` may see (null for a visitor), in display order. */
export function navFor(
  user: Pick<UserDto, 'roles'> | null,
  items: readonly NavItem[] = NAV_ITEMS,
): NavItem[] {
  return items.filter((item) => canSee(item, user));
}

/** One entry of the bar: an item on its own, or a group with the visible items inside it. */
export type NavEntry =
  { kind: 'item'; item: NavItem } | { kind: 'group'; group: NavGroup; items: NavItem[] };

/**
 * The visible items of one section arranged for the bar: ungrouped items in their order, each group at
 * the place of its first visible item (a grouped item belongs to its group's section). A group with no
 * visible item is left out.
 */
export function navEntries(
  items: readonly NavItem[],
  section: NavSection,
  groups: readonly NavGroup[] = NAV_GROUPS,
): NavEntry[] {
  const entries: NavEntry[] = [];
  for (const item of items) {
    const group = item.group ? groups.find((g) => g.id === item.group) : undefined;
    // A grouped item sits where its group sits.
    if ((group?.section ?? item.section) !== section) continue;
    if (!group) {
      entries.push({ kind: 'item', item });
      continue;
    }
    const existing = entries.find(
      (e): e is Extract<NavEntry, { kind: 'group' }> =>
        e.kind === 'group' && e.group.id === group.id,
    );
    if (existing) existing.items.push(item);
    else entries.push({ kind: 'group', group, items: [item] });
  }
  return entries;
}
