import type { InferCreationAttributes, Model } from 'sequelize';
import bcrypt from 'bcryptjs';
import type { Role } from '@app/shared';
import { Boat, Listing, MembershipPlan, Post, User, UserRole, type Payment } from '../models';
import { createPayment } from '../modules/payments/new-payment';
import { chainListing } from './exchange';
import { TEST_PASSWORD } from './test-app';

let seq = 0;
const next = () => (seq += 1);

type Over<M extends Model> = Partial<InferCreationAttributes<M>>;

// Users keep their own counter (user1…, Test Sailor 1…), apart from the other builders' one.
let userSeq = 0;

/** A verified user with the given roles (member by default), signing in with TEST_PASSWORD. */
export async function buildUser(
  opts: { roles?: Role[]; verified?: boolean; email?: string; displayName?: string } = {},
) {
  userSeq += 1;
  const user = await User.create({
    email: opts.email ?? `user${userSeq}-${Date.now()}@test.example`,
    displayName: opts.displayName ?? `Test Sailor ${userSeq}`,
    passwordHash: await bcrypt.hash(TEST_PASSWORD, 4),
    emailVerifiedAt: opts.verified === false ? null : new Date(),
  });
  for (const role of opts.roles ?? ['member'])
    await UserRole.create({ userId: user.id, role, grantedById: null });
  return user;
}

/** A sailing boat of `owner` (9 m, 1 m bow height), overrides last. */
export const buildBoat = (owner: Pick<User, 'id'>, over: Over<Boat> = {}) =>
  Boat.create({
    ownerId: owner.id,
    name: `Test Boat ${next()}`,
    hull: 'sail',
    loaM: 9,
    beamM: null,
    displacementKg: null,
    draftM: null,
    bowHeightM: 1,
    gypsy: null,
    homeHarborId: null,
    ...over,
  });

/** An approved public article by `author`, written straight to the table (no index, no moderation). */
export function buildPost(author: Pick<User, 'id'>, over: Over<Post> = {}) {
  const text = over.bodyText ?? `Test post text ${next()}`;
  return Post.create({
    authorId: author.id,
    topicId: null,
    boatId: null,
    kind: 'article',
    title: `Test post ${seq}`,
    bodyJson: { type: 'doc' },
    bodyHtml: `<p>${text}</p>`,
    bodyText: text,
    approvedText: text,
    status: 'approved',
    visibility: 'public',
    setup: null,
    moderationNote: null,
    acceptedCommentId: null,
    pinnedAt: null,
    lockedAt: null,
    publishedAt: new Date(),
    ...over,
  });
}

/** An active chain listing of `seller` in `harborId`, written straight to the table (the index is not told). */
export const buildListing = (
  seller: Pick<User, 'id'>,
  harborId: number,
  over: Over<Listing> = {},
) =>
  Listing.create({
    ...chainListing(harborId),
    specs: { grade: 'G43', tradeSizeIn: 0.375, lengthM: 30, galvanizing: 'good' },
    sellerId: seller.id,
    status: 'active',
    sizeMm: 9.5,
    publishedAt: new Date(),
    expiresAt: new Date(Date.now() + 30 * 86_400_000),
    soldAt: null,
    soldThreadId: null,
    hiddenAt: null,
    hiddenReason: null,
    ...over,
  });

/** A yearly membership plan: €120.00, no proration, overrides last. */
export const buildPlan = (over: Over<MembershipPlan> = {}) =>
  MembershipPlan.create({
    code: `plan-${next()}`,
    name: 'Individual',
    amountMinor: 12000,
    currency: 'EUR',
    proration: 'none',
    ...over,
  });

/** A cheque payment of €120.00 by `member` for `plan` (null: no plan), succeeded; overrides last. */
export const buildPayment = (
  member: Pick<User, 'id'>,
  plan: Pick<MembershipPlan, 'id'> | null,
  over: Over<Payment> = {},
) =>
  createPayment({
    userId: member.id,
    planId: plan?.id ?? null,
    method: 'cheque',
    status: 'succeeded',
    amountMinor: 12000,
    currency: 'EUR',
    expectedMinor: 12000,
    paidAt: new Date(),
    ...over,
  });
