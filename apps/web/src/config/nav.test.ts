import type { Role } from '@app/shared';
import { describe, expect, it } from 'vitest';
import { NAV_ITEMS, navFor, type NavItem } from './nav';

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
        'Account',
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
        'Account',
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
        'Account',
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
        'Account',
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
        'Account',
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
        'Account',
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
        'Account',
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
