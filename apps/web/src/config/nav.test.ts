import type { Role } from '@app/shared';
import { describe, expect, it } from 'vitest';
import { NAV_ITEMS, navEntries, navFor, type NavEntry, type NavItem } from './nav';

const labels = (items: NavItem[]) => items.map((item) => item.label);
const asUser = (...roles: Role[]) => ({ roles });

describe('navFor', () => {
  it.each([
    ['a visitor', null, ['Home', 'Knowledge', 'Calculators', 'Exchange', 'Sign in', 'Join']],
    [
      'a signed-in person with no roles',
      asUser(),
      [
        'Home',
        'Knowledge',
        'Calculators',
        'Exchange',
        'Messages',
        'My boats',
        'Storm watch',
        'Notices',
        'Settings',
        'Sign out',
      ],
    ],
    [
      'a member',
      asUser('member'),
      [
        'Home',
        'Knowledge',
        'Calculators',
        'Exchange',
        'Messages',
        'My boats',
        'Storm watch',
        'Dues',
        'Notices',
        'Settings',
        'Sign out',
      ],
    ],
    [
      'a moderator',
      asUser('moderator'),
      [
        'Home',
        'Knowledge',
        'Calculators',
        'Exchange',
        'Messages',
        'My boats',
        'Storm watch',
        'Moderation',
        'Notices',
        'Settings',
        'Sign out',
      ],
    ],
    [
      'a treasurer',
      asUser('treasurer'),
      [
        'Home',
        'Knowledge',
        'Calculators',
        'Exchange',
        'Messages',
        'My boats',
        'Storm watch',
        'Treasury',
        'Notices',
        'Settings',
        'Sign out',
      ],
    ],
    [
      'an admin',
      asUser('admin'),
      [
        'Home',
        'Knowledge',
        'Calculators',
        'Exchange',
        'Messages',
        'My boats',
        'Storm watch',
        'Admin',
        'Notices',
        'Settings',
        'Sign out',
      ],
    ],
    [
      'a member who is also treasurer and admin',
      asUser('member', 'treasurer', 'admin'),
      [
        'Home',
        'Knowledge',
        'Calculators',
        'Exchange',
        'Messages',
        'My boats',
        'Storm watch',
        'Dues',
        'Treasury',
        'Admin',
        'Notices',
        'Settings',
        'Sign out',
      ],
    ],
    [
      'a moderator and treasurer',
      asUser('moderator', 'treasurer'),
      [
        'Home',
        'Knowledge',
        'Calculators',
        'Exchange',
        'Messages',
        'My boats',
        'Storm watch',
        'Treasury',
        'Moderation',
        'Notices',
        'Settings',
        'Sign out',
      ],
    ],
  ])('shows %s the right items', (_who, user, expected) => {
    expect(labels(navFor(user))).toEqual(expected);
  });

  it('keeps the order of the item list', () => {
    const all = navFor(asUser('admin'));
    const order = all.map((item) => NAV_ITEMS.indexOf(item));
    expect(order).toEqual([...order].sort((a, b) => a - b));
  });

  it('shows a role item to anyone holding one of its roles, and never to visitors', () => {
    const items: NavItem[] = [
      {
        id: 'money',
        kind: 'link',
        label: 'Money',
        to: '/money',
        section: 'primary',
        roles: ['treasurer', 'admin'],
      },
      { id: 'open', kind: 'link', label: 'Open', to: '/open', section: 'primary' },
    ];
    expect(labels(navFor(asUser('treasurer'), items))).toEqual(['Money', 'Open']);
    expect(labels(navFor(asUser('admin'), items))).toEqual(['Money', 'Open']);
    expect(labels(navFor(asUser('member'), items))).toEqual(['Open']);
    expect(labels(navFor(null, items))).toEqual(['Open']);
  });

  it('gives every item a unique id', () => {
    const ids = NAV_ITEMS.map((item) => item.id);
    expect(new Set(ids).size).toBe(ids.length);
  });
});

const shape = (entries: NavEntry[]) =>
  entries.map((e) =>
    e.kind === 'item'
      ? e.item.label
      : `${e.group.label}: ${e.items.map((i) => i.label).join(', ')}`,
  );

describe('navEntries', () => {
  it('keeps the bar to the club areas plus one menu for a member', () => {
    const items = navFor(asUser('member'));
    expect(shape(navEntries(items, 'primary'))).toEqual([
      'Home',
      'Knowledge',
      'Calculators',
      'Exchange',
      'Storm watch',
    ]);
    expect(shape(navEntries(items, 'account'))).toEqual([
      'Account: Messages, My boats, Dues, Notices, Settings, Sign out',
    ]);
  });

  it("gathers an officer's desks under one menu", () => {
    const items = navFor(asUser('member', 'moderator', 'treasurer', 'admin'));
    expect(shape(navEntries(items, 'primary'))).toEqual([
      'Home',
      'Knowledge',
      'Calculators',
      'Exchange',
      'Storm watch',
      'Desks: Treasury, Moderation, Admin',
    ]);
  });

  it('leaves visitors their sign-in links and no empty menus', () => {
    const items = navFor(null);
    expect(shape(navEntries(items, 'primary'))).toEqual([
      'Home',
      'Knowledge',
      'Calculators',
      'Exchange',
    ]);
    expect(shape(navEntries(items, 'account'))).toEqual(['Sign in', 'Join']);
  });

  it('places a new item by its group alone', () => {
    const extra: NavItem = {
      id: 'extra',
      kind: 'link',
      label: 'Extra desk',
      to: '/extra',
      section: 'primary',
      roles: ['moderator'],
      group: 'desks',
    };
    const items = navFor(asUser('moderator'), [...NAV_ITEMS, extra]);
    expect(shape(navEntries(items, 'primary')).at(-1)).toBe('Desks: Moderation, Extra desk');
  });
});
