import type { PostSetup, PostStatus } from '@app/shared';
import { STARTING_TOPICS } from '../src/modules/topics/starting-topics';
import {
  AuditEvent,
  Boat,
  Comment,
  Notification,
  Post,
  Report,
  Topic,
  User,
  Vote,
} from '../src/models';
import { renderBody } from '../src/modules/posts/body-render';
import type { SeedContext } from './seed-context';

// Invented posts by the invented members of the demo club. Figures in setups are demo data.
const p = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });
const h = (text: string) => ({
  type: 'heading',
  attrs: { level: 2 },
  content: [{ type: 'text', text }],
});
const ul = (...items: string[]) => ({
  type: 'bulletList',
  content: items.map((t) => ({ type: 'listItem', content: [p(t)] })),
});
const quote = (text: string) => ({ type: 'blockquote', content: [p(text)] });
const doc = (...content: object[]) => ({ type: 'doc', content });

const MARRAM_SETUP: PostSetup = {
  boat: {
    label: 'Marram',
    hull: 'sail',
    loaM: 9.1,
    beamM: 3.2,
    displacementKg: 4300,
    bowHeightM: 1.1,
  },
  windKn: 35,
  depthM: 5,
  tideM: 1.5,
  bottom: 'sand',
  components: {
    anchor: { type: 'scoop', massKg: 15 },
    chain: { grade: 'G43', tradeSizeIn: 0.3125, lengthM: 50 },
    snubber: { material: 'nylon', diameterMm: 14, lengthM: 7 },
    connectors: [{ label: 'anchor shackle', kind: 'shackle', nominalIn: 0.375 }],
  },
};
const TERN_SETUP: PostSetup = {
  boat: {
    label: 'Slow Tern',
    hull: 'power',
    loaM: 12.2,
    beamM: 4.1,
    displacementKg: 11000,
    bowHeightM: 1.6,
  },
  windKn: 42,
  depthM: 7,
  tideM: 1,
  components: {
    anchor: { type: 'plow', massKg: 25 },
    chain: { grade: 'G43', tradeSizeIn: 0.375, lengthM: 30 },
    rode: { material: 'nylon', construction: 'three-strand', diameterMm: 16, lengthM: 60 },
    connectors: [
      { label: 'swivel', kind: 'swivel', wllN: 9800 },
      { label: 'rope-to-chain splice', kind: 'splice' },
    ],
  },
};

interface DemoPost {
  key: string;
  author: string;
  topic: string;
  kind: 'article' | 'question';
  title: string;
  body: object;
  status: PostStatus;
  daysAgo: number;
  setup?: PostSetup;
  members?: boolean;
  pinned?: boolean;
  note?: string;
  boatOf?: string;
}

const POSTS: DemoPost[] = [
  {
    key: 'snubber',
    author: 'maren',
    topic: 'snubbers-and-bridles',
    kind: 'article',
    status: 'approved',
    daysAgo: 40,
    setup: MARRAM_SETUP,
    pinned: true,
    title: 'The snubber that finally stopped the snatching',
    body: doc(
      h('What changed'),
      p(
        'Seven metres of 14 mm three-strand nylon on a chain hook, led through the bow roller fairlead, took the jerk out of the rode on a choppy night off Brindle Basin.',
      ),
      ul(
        'Chafe guard where it crosses the roller',
        'A back-up line in case the hook lets go',
        'Let out enough that the chain hangs in a loop behind the hook',
      ),
      quote('Check the snubber at first light: ours had walked off the roller by dawn.'),
    ),
  },
  {
    key: 'chain',
    author: 'idris',
    topic: 'rode-and-chain',
    kind: 'article',
    status: 'approved',
    daysAgo: 35,
    setup: TERN_SETUP,
    title: 'Chain and nylon rode on a 12 m motor cruiser',
    body: doc(
      p(
        'Thirty metres of grade 43 chain then sixty metres of nylon. The splice runs over the gypsy if you keep it tidy.',
      ),
      h('Marking the rode'),
      p('Cable ties every ten metres, coloured by tens; they last about two seasons.'),
    ),
  },
  {
    key: 'weed',
    author: 'saoirse',
    topic: 'anchoring',
    kind: 'article',
    status: 'approved',
    daysAgo: 30,
    title: 'Setting an anchor in weed off Otterhythe Quay',
    body: doc(
      p(
        'Weed clogs the tip of most anchors. A scoop with a roll-bar set on the second try; a claw never did.',
      ),
      p('Back down gently first, then harder once it bites.'),
    ),
  },
  {
    key: 'gale',
    author: 'bram',
    topic: 'storm-preparation',
    kind: 'article',
    status: 'approved',
    daysAgo: 25,
    title: 'Our gale checklist for a small boat on a swing mooring',
    body: doc(
      ul(
        'Double the mooring pennant, with chafe gear on both',
        'Strip the headsail and lash the boom',
        'Take dinghy and cushions ashore',
        'Tell the harbour office you are leaving the boat',
      ),
    ),
  },
  {
    key: 'splice',
    author: 'maren',
    topic: 'rigging-and-splicing',
    kind: 'article',
    status: 'approved',
    daysAgo: 20,
    members: true,
    title: 'A rope-to-chain splice, step by step',
    body: doc(
      p(
        'Unlay about thirty centimetres, pass the strands through the end link in pairs and tuck back against the lay.',
      ),
      { type: 'codeBlock', content: [{ type: 'text', text: 'tucks: 4 full, 2 tapered' }] },
    ),
  },
  {
    key: 'galv',
    author: 'idris',
    topic: 'maintenance',
    kind: 'article',
    status: 'approved',
    daysAgo: 15,
    title: 'When to regalvanise chain',
    body: doc(
      p(
        'Once rust shows on the bearing surfaces of the links, the galvanising is gone there. Measure a few worn links with callipers and compare with new.',
      ),
    ),
  },
  {
    key: 'q-anchor',
    author: 'bram',
    topic: 'anchoring',
    kind: 'question',
    status: 'approved',
    daysAgo: 12,
    boatOf: 'bram',
    title: 'What anchor fits a 7.3 m sloop that anchors in sand and mud?',
    body: doc(
      p(
        'Greywake came with a small fluke anchor that drags in soft mud. What would you fit, and how heavy?',
      ),
    ),
  },
  {
    key: 'passage',
    author: 'saoirse',
    topic: 'passage-planning',
    kind: 'article',
    status: 'approved',
    daysAgo: 8,
    title: 'Choosing an anchorage for a wind shift at night',
    body: doc(
      p(
        'Pick a spot with shelter from where the wind is going, not where it is now, and swinging room for the full scope.',
      ),
    ),
  },
  {
    key: 'pending-bridle',
    author: 'saoirse',
    topic: 'snubbers-and-bridles',
    kind: 'article',
    status: 'pending',
    daysAgo: 2,
    title: 'A bridle for a catamaran with a single bow roller',
    body: doc(
      p(
        'Two legs of 16 mm nylon from the bow cleats to a chain hook, each leg about twice the beam.',
      ),
    ),
  },
  {
    key: 'pending-swivel',
    author: 'bram',
    topic: 'rode-and-chain',
    kind: 'question',
    status: 'pending',
    daysAgo: 1,
    title: 'Is a swivel between chain and anchor worth it?',
    body: doc(p('I read both sides. Has anyone here had a swivel fail?')),
  },
  {
    key: 'pending-storm',
    author: 'idris',
    topic: 'storm-preparation',
    kind: 'article',
    status: 'pending',
    daysAgo: 0,
    title: 'Second anchor in tandem: what went wrong',
    body: doc(
      p(
        'We set a second anchor on the chain of the first. Retrieving it in a chop was the hard part.',
      ),
    ),
  },
  {
    key: 'rejected',
    author: 'bram',
    topic: 'maintenance',
    kind: 'article',
    status: 'rejected',
    daysAgo: 5,
    note: 'Please add what you replaced and the sizes, so others can learn from it.',
    title: 'Fixed my windlass',
    body: doc(p('It works now.')),
  },
  {
    key: 'draft',
    author: 'maren',
    topic: 'anchoring',
    kind: 'article',
    status: 'draft',
    daysAgo: 1,
    title: 'Notes on anchoring under sail',
    body: doc(p('Half written: approach, drop, let her fall back…')),
  },
];

const email = (who: string) => `${who}@larkspit.example`;

/** Topics, a dozen posts across them (some pending), comments, votes, a report and a few log rows. */
export async function seedKnowledge(ctx: SeedContext) {
  const { transaction, users, now } = ctx;
  const userId = (who: string) => {
    const u = users.get(email(who));
    if (!u) throw new Error(`demo user ${who} missing`);
    return u.id;
  };
  const topics = new Map<string, Topic>();
  for (const [i, [slug, name, description]] of STARTING_TOPICS.entries()) {
    const [t] = await Topic.findOrCreate({
      where: { slug },
      defaults: { slug, name, description, position: (i + 1) * 10 },
      transaction,
    });
    topics.set(slug, t);
  }
  const modId = userId('moderator');
  const at = (daysAgo: number, hour = 9) =>
    new Date(now.getTime() - daysAgo * 86_400_000 - hour * 3_600_000);
  const posts = new Map<string, Post>();
  for (const d of POSTS) {
    const { html, text } = renderBody(d.body);
    const boat = d.boatOf
      ? await Boat.findOne({ where: { ownerId: userId(d.boatOf) }, transaction })
      : null;
    const when = at(d.daysAgo);
    const post = await Post.create(
      {
        authorId: userId(d.author),
        topicId: topics.get(d.topic)?.id ?? null,
        boatId: boat?.id ?? null,
        kind: d.kind,
        title: d.title,
        bodyJson: d.body,
        bodyHtml: html,
        bodyText: text,
        approvedText: d.status === 'approved' ? text : null,
        status: d.status,
        visibility: d.members ? 'members' : 'public',
        setup: d.setup ?? null,
        moderationNote: d.note ?? null,
        acceptedCommentId: null,
        pinnedAt: d.pinned ? when : null,
        lockedAt: null,
        publishedAt: d.status === 'approved' ? when : null,
        createdAt: when,
        updatedAt: when,
      },
      { transaction },
    );
    posts.set(d.key, post);
    if (d.status === 'approved' || d.status === 'rejected')
      await AuditEvent.create(
        {
          actorId: modId,
          area: 'moderation',
          action: d.status === 'approved' ? 'post.publish' : 'post.decline',
          subjectType: 'post',
          subjectId: String(post.id),
          reason: d.note ?? null,
          details: { title: d.title },
          createdAt: at(d.daysAgo, 7),
        },
        { transaction },
      );
  }
  const comment = async (
    key: string,
    who: string,
    body: string,
    status: 'approved' | 'pending',
    parentId: number | null = null,
  ) => {
    const post = posts.get(key);
    if (!post) throw new Error(`demo post ${key} missing`);
    return Comment.create(
      { postId: post.id, authorId: userId(who), parentId, body, status, moderationNote: null },
      { transaction },
    );
  };
  const a1 = await comment(
    'q-anchor',
    'maren',
    'A 10 kg scoop set first time for us in both sand and mud.',
    'approved',
  );
  await comment(
    'q-anchor',
    'bram',
    'Thanks, that is the weight I was wondering about.',
    'approved',
    a1.id,
  );
  await comment(
    'q-anchor',
    'idris',
    'A plow of similar weight works too; add a few metres of chain.',
    'approved',
  );
  await posts.get('q-anchor')?.update({ acceptedCommentId: a1.id }, { transaction });
  await comment(
    'snubber',
    'saoirse',
    'We use the same, with a rolling hitch instead of a hook.',
    'approved',
  );
  await comment(
    'gale',
    'maren',
    'Add: check the shackle mousing on the mooring itself.',
    'approved',
  );
  const spam = await comment('weed', 'bram', 'Selling an anchor, message me, cheap!!!', 'approved');
  await comment('chain', 'saoirse', 'How often do you end-for-end the chain?', 'pending');
  await Report.create(
    {
      reporterId: userId('saoirse'),
      targetType: 'comment',
      targetId: spam.id,
      reason: 'Selling belongs in the exchange, not in the knowledge posts.',
      resolution: null,
      resolvedById: null,
    },
    { transaction },
  );
  for (const [key, voters] of [
    ['snubber', ['idris', 'saoirse', 'bram']],
    ['chain', ['maren', 'bram']],
    ['gale', ['maren', 'saoirse', 'idris']],
    ['q-anchor', ['idris']],
  ] as const) {
    const post = posts.get(key);
    if (!post) continue;
    for (const v of voters)
      await Vote.create({ postId: post.id, userId: userId(v) }, { transaction });
    await post.update({ helpfulCount: voters.length }, { transaction });
  }
  // In-app notices for what happened above (the services write these as it happens); Maren gets the daily
  // digest, so the first digest run after start mails her the two she has not read.
  const title = (key: string) => posts.get(key)?.title ?? '';
  const link = (key: string) => `/knowledge/${posts.get(key)?.id ?? 0}`;
  for (const [who, kind, message, key, daysAgo, read] of [
    [
      'maren',
      'accepted',
      `The asker says your answer on “${title('q-anchor')}” worked`,
      'q-anchor',
      3,
      true,
    ],
    ['maren', 'reply', `New reply to your comment on “${title('q-anchor')}”`, 'q-anchor', 2, false],
    ['maren', 'reply', `New comment on “${title('snubber')}”`, 'snubber', 1, false],
    ['bram', 'reply', `New answer on “${title('q-anchor')}”`, 'q-anchor', 4, true],
    ['bram', 'reply', `New comment on “${title('gale')}”`, 'gale', 1, false],
  ] as const)
    await Notification.create(
      {
        userId: userId(who),
        kind,
        message,
        link: link(key),
        readAt: read ? at(daysAgo - 1) : null,
        createdAt: at(daysAgo),
      },
      { transaction },
    );
  await User.update({ digestOptIn: true }, { where: { id: userId('maren') }, transaction });
}
