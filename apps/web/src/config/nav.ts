import type { Role, UserDto } from '@app/shared';
import { paths } from './paths';

/** Where an item sits: `primary` = the club's areas, `account` = the person's own links at the end. */
export type NavSection = 'primary' | 'account';

interface NavItemBase {
  /** Stable id, also the React key. */
  id: string;
  label: string;
  section: NavSection;
  /** Shown only to signed-in people holding at least one of these roles (implies signed in). */
  roles?: readonly Role[];
  /** true: signed-in people only; false: visitors only; left out: everyone. */
  signedIn?: boolean;
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
 * Every navigation item, in display order. To add an area (calculators, boats, knowledge, exchange, dues,
 * treasury, moderation), add its path to `config/paths.ts` and one entry here, e.g.
 * `{ id: 'treasury', kind: 'link', label: 'Treasury', to: paths.treasury.href(), section: 'primary', roles: ['treasurer'] }`.
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
  },
  {
    id: 'boats',
    kind: 'link',
    label: 'My boats',
    to: paths.boats.href(),
    section: 'primary',
    signedIn: true,
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
  },
  {
    id: 'treasury',
    kind: 'link',
    label: 'Treasury',
    to: paths.treasury.href(),
    section: 'primary',
    roles: ['treasurer'],
  },
  {
    id: 'moderation',
    kind: 'link',
    label: 'Moderation',
    to: paths.moderation.href(),
    section: 'primary',
    roles: ['moderator'],
    badge: 'moderation-waiting',
  },
  {
    id: 'admin-users',
    kind: 'link',
    label: 'Admin',
    to: paths.adminUsers.href(),
    section: 'primary',
    roles: ['admin'],
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
    to: paths.notifications.href(),
    section: 'account',
    signedIn: true,
    badge: 'notices-unread',
  },
  {
    id: 'account',
    kind: 'link',
    label: 'Account',
    to: paths.account.href(),
    section: 'account',
    signedIn: true,
  },
  {
    id: 'sign-out',
    kind: 'action',
    label: 'Sign out',
    action: 'sign-out',
    section: 'account',
    signedIn: true,
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
