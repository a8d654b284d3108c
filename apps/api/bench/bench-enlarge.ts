import bcrypt from 'bcryptjs';
import { listingInputSchema, type ListingCategory, type ListingCondition } from '@app/shared';
import {
  Comment,
  Harbor,
  Listing,
  Membership,
  MembershipPlan,
  Post,
  Topic,
  User,
  UserRole,
} from '../src/models';
import { sizeMmOf } from '../src/modules/listings/listing-specs';
import { renderBody } from '../src/modules/posts/body-render';

// Grows the demo club to benchmark size with invented members, gear and posts. Benchmark data only: every
// name, price and size is made up, and nothing here is advice.

export interface EnlargeTargets {
  members: number;
  listings: number;
  posts: number;
}
export const BENCH_TARGETS: EnlargeTargets = { members: 2000, listings: 10_000, posts: 2000 };
const CHUNK = 1000;

/** A small seeded generator so every run makes the same data. */
function generator(seed: number) {
  let s = seed;
  const next = () => (s = (s * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
  const pick = <T>(xs: readonly T[]): T => xs[Math.floor(next() * xs.length)] as T;
  const int = (lo: number, hi: number) => lo + Math.floor(next() * (hi - lo + 1));
  return { next, pick, int };
}

const GIVEN = ['Ailsa', 'Bryn', 'Cato', 'Dara', 'Efa', 'Fenn', 'Gwen', 'Hale', 'Ivo', 'Jory'];
const FAMILY = ['Backstay', 'Cleatley', 'Dorade', 'Eddywell', 'Foxlee', 'Gaffney', 'Hawsepipe'];
const ANCHOR_TYPES = ['plow', 'claw', 'fluke', 'scoop', 'grapnel', 'fisherman'] as const;
const CONDITIONS: ListingCondition[] = ['new', 'like-new', 'good', 'fair'];
const NOTES = [
  'Stowed dry over winter.',
  'Marked every ten metres.',
  'Spare from a refit.',
  'Light surface rust, sound links.',
  'Selling after a change of boat.',
  'Collect from the club pontoon.',
];

type Spec = { category: ListingCategory; title: string; specs: Record<string, unknown> };
function gear(g: ReturnType<typeof generator>, i: number): Spec {
  switch (i % 5) {
    case 0: {
      const size = g.pick([0.25, 0.3125, 0.375, 0.5]);
      const len = g.int(10, 90);
      const grade = g.pick(['G30', 'G43', 'G70'] as const);
      return {
        category: 'chain',
        title: `Grade ${grade.slice(1)} chain ${size} in, ${len} m`,
        specs: { grade, tradeSizeIn: size, lengthM: len, galvanizing: 'good' },
      };
    }
    case 1: {
      const type = g.pick(ANCHOR_TYPES);
      const kg = g.int(4, 45);
      return {
        category: 'anchor',
        title: `${type[0]?.toUpperCase()}${type.slice(1)} anchor ${kg} kg`,
        specs: { anchorType: type, massKg: kg },
      };
    }
    case 2: {
      const d = g.pick([10, 12, 14, 16, 18, 20]);
      const len = g.int(20, 100);
      return {
        category: 'rode',
        title: `Nylon three-strand rode ${d} mm, ${len} m`,
        specs: { material: 'nylon', construction: 'three-strand', diameterMm: d, lengthM: len },
      };
    }
    case 3: {
      const d = g.pick([12, 14, 16, 18]);
      const len = g.int(4, 10);
      return {
        category: 'snubber',
        title: `Nylon snubber ${d} mm, ${len} m`,
        specs: { material: 'nylon', diameterMm: d, lengthM: len },
      };
    }
    default: {
      const inch = g.pick([0.3125, 0.375, 0.5]);
      return {
        category: 'connector',
        title: `Forged anchor shackle ${inch} in`,
        specs: { kind: 'shackle', nominalIn: inch },
      };
    }
  }
}

const p = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const POST_BODIES = [
  [
    p('How we lay out the rode on the foredeck before a night at anchor.'),
    p('Always check the working load limit the maker states for each part.'),
  ],
  [
    p('A short note on chafe where the snubber crosses the roller.'),
    p('Look at it at first light and again after any wind shift.'),
  ],
  [
    p('Marking chain with cable ties, coloured by tens.'),
    p('They last a season or two; re-mark after regalvanising.'),
  ],
].map((content) => {
  const doc = { type: 'doc', content };
  return { doc, ...renderBody(doc) };
});
const POST_SUBJECTS = ['scope', 'snubber', 'chain marks', 'swivel', 'kedge', 'bridle', 'windlass'];
const COMMENTS = ['Same here.', 'Useful, thank you.', 'What diameter did you use?', 'Agreed.'];

/**
 * Adds invented members (each with a member role and a membership), active listings and approved posts with a
 * few comments until the database holds `targets`. Bulk inserts in chunks of 1,000; run after the demo seed.
 * Returns how many rows of each kind it added (zeros when the targets were already met).
 */
export async function enlargeDemo(
  bcryptCost: number,
  targets: EnlargeTargets = BENCH_TARGETS,
  now = new Date(),
): Promise<EnlargeTargets & { comments: number }> {
  const g = generator(7);
  const added = { members: 0, listings: 0, posts: 0, comments: 0 };
  const harbors = await Harbor.findAll();
  const plan = await MembershipPlan.findOne({ order: [['id', 'ASC']] });
  if (!harbors.length || !plan) throw new Error('run the demo seed before enlarging it');
  const day = (offset: number) =>
    new Date(now.getTime() + offset * 86_400_000).toISOString().slice(0, 10);

  const hash = await bcrypt.hash('bench-member-only', bcryptCost);
  for (let have = await User.count(); have < targets.members;) {
    const n = Math.min(CHUNK, targets.members - have);
    const users = await User.bulkCreate(
      Array.from({ length: n }, (_, k) => ({
        email: `bench-member-${have + k}@larkspit.example`,
        displayName: `${g.pick(GIVEN)} ${g.pick(FAMILY)} ${have + k}`,
        passwordHash: hash,
        emailVerifiedAt: now,
      })),
    );
    await UserRole.bulkCreate(
      users.map((u) => ({ userId: u.id, role: 'member', grantedById: null })),
    );
    await Membership.bulkCreate(
      users.map((u) => ({
        userId: u.id,
        planId: plan.id,
        joinedOn: day(-g.int(30, 3000)),
        // Most are paid up; about one in six is behind, as in any club.
        paidThrough: g.next() < 0.83 ? day(g.int(30, 300)) : day(-g.int(1, 200)),
      })),
    );
    have += n;
    added.members += n;
  }
  const memberIds = (await User.findAll({ attributes: ['id'] })).map((u) => u.id);

  for (let have = await Listing.count(); have < targets.listings;) {
    const n = Math.min(CHUNK, targets.listings - have);
    await Listing.bulkCreate(
      Array.from({ length: n }, (_, k) => {
        const i = have + k;
        const { category, title, specs } = gear(g, i);
        // Parsed with the schema the API uses, so the data is what a seller could have entered.
        const input = listingInputSchema.parse({
          category,
          title,
          specs,
          description: `${g.pick(NOTES)} ${g.pick(NOTES)} Lot ${i}.`,
          condition: g.pick(CONDITIONS),
          priceCents: 500 + g.int(0, 60_000),
          currency: 'EUR',
          harborId: g.pick(harbors).id,
        });
        const parsedSpecs = input.specs as Record<string, unknown>;
        return {
          ...input,
          specs: parsedSpecs,
          sellerId: g.pick(memberIds),
          status: 'active' as const,
          sizeMm: sizeMmOf(input.category, parsedSpecs),
          publishedAt: new Date(now.getTime() - i * 60_000),
          expiresAt: new Date(now.getTime() + 30 * 86_400_000),
          soldAt: null,
          soldThreadId: null,
          hiddenAt: null,
          hiddenReason: null,
        };
      }),
    );
    have += n;
    added.listings += n;
  }

  const topics = await Topic.findAll();
  for (let have = await Post.count(); have < targets.posts;) {
    const n = Math.min(CHUNK, targets.posts - have);
    const posts = await Post.bulkCreate(
      Array.from({ length: n }, (_, k) => {
        const i = have + k;
        const body = g.pick(POST_BODIES);
        const approved = g.next() < 0.95;
        const when = new Date(now.getTime() - i * 3_600_000);
        return {
          authorId: g.pick(memberIds),
          topicId: topics.length ? g.pick(topics).id : null,
          boatId: null,
          kind: g.next() < 0.7 ? ('article' as const) : ('question' as const),
          title: `Notes on ${g.pick(POST_SUBJECTS)}, ${g.pick(POST_SUBJECTS)} and ${i % 97} m of depth`,
          bodyJson: body.doc,
          bodyHtml: body.html,
          bodyText: body.text,
          approvedText: approved ? body.text : null,
          status: approved ? ('approved' as const) : ('pending' as const),
          visibility: g.next() < 0.9 ? ('public' as const) : ('members' as const),
          setup: null,
          moderationNote: null,
          acceptedCommentId: null,
          pinnedAt: null,
          lockedAt: null,
          publishedAt: approved ? when : null,
          createdAt: when,
          updatedAt: when,
        };
      }),
    );
    const comments = posts.flatMap((post) =>
      Array.from({ length: g.int(0, 3) }, () => ({
        postId: post.id,
        authorId: g.pick(memberIds),
        parentId: null,
        body: g.pick(COMMENTS),
        status: 'approved' as const,
        moderationNote: null,
      })),
    );
    await Comment.bulkCreate(comments);
    have += n;
    added.posts += n;
    added.comments += comments.length;
  }
  return added;
}
