import { describe, expect, it } from 'vitest';
import type { PostStatus, PostVisibility, Role } from '@app/shared';
import {
  canAcceptAnswer,
  canEditPost,
  canSeeComment,
  canSeePost,
  canVoteOn,
  publishesWithoutReview,
} from './posts';
import type { Actor } from './roles';

const person = (id: number, ...roles: Role[]): Actor => ({ id, hasRole: (r) => roles.includes(r) });
const author = person(1, 'member');
const other = person(2, 'member');
const moderator = person(3, 'member', 'moderator');
const admin = person(4, 'member', 'admin');
const post = (status: PostStatus, visibility: PostVisibility = 'public') => ({
  authorId: author.id,
  status,
  visibility,
});

describe('canSeePost', () => {
  it.each([
    // status, visibility, visitor, author, other member, moderator, admin
    ['approved', 'public', true, true, true, true, true],
    ['approved', 'members', false, true, true, true, true],
    ['pending', 'public', false, true, false, true, false],
    ['draft', 'public', false, true, false, true, false],
    ['rejected', 'members', false, true, false, true, false],
    ['hidden', 'public', false, true, false, true, false],
  ] as const)('%s %s post', (status, visibility, visitor, a, o, m, ad) => {
    const p = post(status, visibility);
    expect([null, author, other, moderator, admin].map((u) => canSeePost(u, p))).toEqual([
      visitor,
      a,
      o,
      m,
      ad,
    ]);
  });
});

describe('post rules', () => {
  it('shows unapproved comments to their author and moderators only', () => {
    const pending = { authorId: other.id, status: 'pending' };
    expect([null, author, other, moderator, admin].map((u) => canSeeComment(u, pending))).toEqual([
      false,
      false,
      true,
      true,
      false,
    ]);
    expect(canSeeComment(null, { authorId: other.id, status: 'approved' })).toBe(true);
  });

  it('lets only the author edit, and the author or a moderator accept an answer', () => {
    const p = post('approved');
    expect([author, other, moderator, admin].map((u) => canEditPost(u, p))).toEqual([
      true,
      false,
      false,
      false,
    ]);
    expect([author, other, moderator, admin].map((u) => canAcceptAnswer(u, p))).toEqual([
      true,
      false,
      true,
      false,
    ]);
  });

  it('publishes a moderator’s post at once, nobody else’s (admins included)', () => {
    expect([author, moderator, admin].map(publishesWithoutReview)).toEqual([false, true, false]);
  });

  it('refuses a vote on one’s own post', () => {
    expect(canVoteOn(author, post('approved'))).toBe(false);
    expect(canVoteOn(other, post('approved'))).toBe(true);
  });
});
